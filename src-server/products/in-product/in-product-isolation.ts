import { type FrequencyRange, bandStatistics, interpolateAt } from '../../rf/curves';
import { envelopeCorrelationCurve, isolationCurve } from '../../rf/multiport';
import type { TouchstoneNetwork } from '../../rf/touchstone';
import type { AntennaRole } from './antenna-roles';

/** Printed beside every correlation figure (Blanch, Romeu and Corbella, Electronics Letters 39(9), 2003). */
export const CORRELATION_ASSUMPTION =
  'Envelope correlation from S-parameters (Blanch, Romeu and Corbella, 2003) assumes lossless antennas in a uniform multipath environment; real antennas have losses, so treat it as an estimate and confirm with radiation-pattern measurements in a chamber.';

export interface BandOfRadio {
  readonly id: number;
  readonly designation: string;
  readonly ranges: readonly FrequencyRange[];
}

export interface MappedAntenna {
  readonly measurementId: number;
  readonly port: number;
  readonly radioId: number;
  readonly radioName: string;
  readonly role: AntennaRole;
}

export interface MeasuredAssembly {
  readonly measurementId: number;
  readonly network: TouchstoneNetwork;
}

export interface IsolationMatrix {
  antennas: MappedAntenna[];
  isolation: { a: number; b: number; worstIsolationDb: number | null; bandPairs: { bandA: string; bandB: string; isolationDb: number | null }[] }[];
  correlation: {
    radioId: number;
    radioName: string;
    a: number;
    b: number;
    bandId: number;
    band: string;
    worstEcc: number | null;
    threshold: number;
    aboveThreshold: boolean | null;
  }[];
  correlationAssumption: string;
}

/** Least (isolation) or most (correlation) of a per-point curve over a band's ranges; null without points. */
function worstOverBand(frequenciesHz: Float64Array, values: Float64Array, band: BandOfRadio, worst: 'min' | 'max'): number | null {
  let out: number | null = null;
  for (const range of band.ranges) {
    const stats = bandStatistics({ frequenciesHz, values }, range);
    if (stats.status !== 'ok') continue;
    const value = worst === 'min' ? stats.min : stats.max;
    if (!Number.isFinite(value)) return null;
    out = out === null ? value : worst === 'min' ? Math.min(out, value) : Math.max(out, value);
  }
  return out;
}

/**
 * The isolation between every two mapped antennas of one measurement, worst over each pair of their radios'
 * bands, and the envelope correlation between the antennas of one radio in each of its bands.
 */
export function isolationMatrix(
  assemblies: readonly MeasuredAssembly[],
  antennas: readonly MappedAntenna[],
  bandsOfRadio: ReadonlyMap<number, readonly BandOfRadio[]>,
  eccThreshold: number,
): IsolationMatrix {
  const result: IsolationMatrix = { antennas: [...antennas], isolation: [], correlation: [], correlationAssumption: CORRELATION_ASSUMPTION };
  for (const assembly of assemblies) {
    const { network } = assembly;
    const indices = antennas.flatMap((antenna, i) => (antenna.measurementId === assembly.measurementId ? [i] : []));
    for (let x = 0; x < indices.length; x++) {
      for (let y = x + 1; y < indices.length; y++) {
        const a = antennas[indices[x]];
        const b = antennas[indices[y]];
        const isolation = isolationCurve(network, a.port, b.port);
        const bandPairs: IsolationMatrix['isolation'][number]['bandPairs'] = [];
        for (const bandA of bandsOfRadio.get(a.radioId) ?? []) {
          for (const bandB of bandsOfRadio.get(b.radioId) ?? []) {
            if (a.radioId === b.radioId && bandA.id !== bandB.id) continue;
            const inA = worstOverBand(network.frequenciesHz, isolation, bandA, 'min');
            const inB = bandA.id === bandB.id ? inA : worstOverBand(network.frequenciesHz, isolation, bandB, 'min');
            const known = [inA, inB].filter((v): v is number => v !== null);
            bandPairs.push({ bandA: bandA.designation, bandB: bandB.designation, isolationDb: known.length ? Math.min(...known) : null });
          }
        }
        const known = bandPairs.flatMap((p) => (p.isolationDb === null ? [] : [p.isolationDb]));
        result.isolation.push({ a: indices[x], b: indices[y], worstIsolationDb: known.length ? Math.min(...known) : null, bandPairs });
        if (a.radioId !== b.radioId) continue;
        const ecc = envelopeCorrelationCurve(network, a.port, b.port);
        for (const band of bandsOfRadio.get(a.radioId) ?? []) {
          const worstEcc = worstOverBand(network.frequenciesHz, ecc, band, 'max');
          result.correlation.push({
            radioId: a.radioId,
            radioName: a.radioName,
            a: indices[x],
            b: indices[y],
            bandId: band.id,
            band: band.designation,
            worstEcc,
            threshold: eccThreshold,
            aboveThreshold: worstEcc === null ? null : worstEcc > eccThreshold,
          });
        }
      }
    }
  }
  return result;
}

/** Isolation in dB between an aggressor radio and a victim radio at a frequency; null where it was not measured. */
export type RadioIsolation = (aggressorRadioId: number, victimRadioId: number, atHz: number) => number | null;

/**
 * The measured isolation from any antenna of the aggressor radio to any antenna of the victim radio at a frequency:
 * the least over every such pair in one measurement (the weakest path sets the interference), interpolated between
 * sweep points; null outside every sweep or where the two radios share no measurement, never assumed.
 */
export function radioIsolationLookup(assemblies: readonly MeasuredAssembly[], antennas: readonly MappedAntenna[]): RadioIsolation {
  const curves = new Map<string, { frequenciesHz: Float64Array; values: Float64Array }[]>();
  for (const { measurementId, network } of assemblies) {
    const mapped = antennas.filter((a) => a.measurementId === measurementId);
    for (const aggressor of mapped) {
      for (const victim of mapped) {
        if (aggressor.radioId === victim.radioId) continue;
        const key = `${aggressor.radioId}>${victim.radioId}`;
        const list = curves.get(key) ?? [];
        list.push({ frequenciesHz: network.frequenciesHz, values: isolationCurve(network, aggressor.port, victim.port) });
        curves.set(key, list);
      }
    }
  }
  return (aggressorRadioId, victimRadioId, atHz) => {
    let least: number | null = null;
    for (const curve of curves.get(`${aggressorRadioId}>${victimRadioId}`) ?? []) {
      const value = interpolateAt(curve, atHz);
      if (value === undefined || !Number.isFinite(value)) continue;
      least = least === null ? value : Math.min(least, value);
    }
    return least;
  };
}
