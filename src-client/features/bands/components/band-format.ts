import type { Band } from '../types';

const ROLE_SHORT = { uplink: 'UL', downlink: 'DL', tdd: 'TDD', receive: 'Rx', 'transmit-receive': 'Tx/Rx' } as const;

const mhz = (v: number) => `${Number(v.toFixed(4))}`;

/** "UL 699–716 · DL 729–746 MHz" */
export const describeRanges = (band: Band) => `${band.ranges.map((r) => `${ROLE_SHORT[r.role]} ${mhz(r.fromMhz)}–${mhz(r.toMhz)}`).join(' · ')} MHz`;

export const describeSource = (band: Band) => `${band.source.document}, ${band.source.table}`;
