import { describe, expect, it } from 'vitest';
import { rangesParam } from './part-labels';
import type { LibraryBand } from '../types';

// 3GPP TS 36.101 Table 5.5-1: band 8 UL 880–915, DL 925–960 MHz; band 20 UL 832–862, DL 791–821 MHz.
const band = (designation: string, ranges: [LibraryBand['ranges'][number]['role'], number, number][]): LibraryBand => ({
  id: 1,
  technology: 'lte',
  designation,
  name: designation,
  ranges: ranges.map(([role, fromMhz, toMhz]) => ({ role, fromMhz, toMhz })),
  duplex: 'FDD',
  source: { document: '3GPP TS 36.101', table: 'Table 5.5-1' },
  regions: [],
});

describe('rangesParam', () => {
  it('asks the search for every range of every band, never one span across the duplex gap', () => {
    const b8 = band('B8', [
      ['uplink', 880, 915],
      ['downlink', 925, 960],
    ]);
    const b20 = band('B20', [
      ['uplink', 832, 862],
      ['downlink', 791, 821],
    ]);
    expect(rangesParam([b8])).toBe('880-915,925-960');
    expect(rangesParam([b8, b20])).toBe('880-915,925-960,832-862,791-821');
    // A range two bands share is asked once.
    expect(rangesParam([b8, b8])).toBe('880-915,925-960');
  });
});
