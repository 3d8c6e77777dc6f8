import { type Complex, complex } from './complex';
import { type BandResult, type FrequencyRange, bandStatistics, coverageOfBand, interpolateAt, rangesAtMost } from './curves';
import { gammaMagnitudeFromReturnLossDb, gammaMagnitudeFromVswr, impedanceFromGamma, returnLossDbFromGammaMagnitude, vswrFromGammaMagnitude } from './mismatch';
import { type TouchstoneNetwork, sParameter } from './touchstone';

/**
 * The reflection of one port over frequency. Between samples |Γ| is interpolated linearly in
 * frequency; VSWR and return loss are derived from that |Γ|, so every criterion sees the same curve.
 */
export interface ReflectionCurve {
  readonly port: number;
  readonly referenceOhms: number;
  readonly frequenciesHz: Float64Array;
  readonly gammaRe: Float64Array;
  readonly gammaIm: Float64Array;
  readonly gammaMagnitude: Float64Array;
}

export function reflectionCurveFromGamma(
  frequenciesHz: Float64Array,
  gammaRe: Float64Array,
  gammaIm: Float64Array,
  referenceOhms = 50,
  port = 1,
): ReflectionCurve {
  const gammaMagnitude = new Float64Array(frequenciesHz.length);
  // sqrt of the sum of squares: Math.hypot is several times slower and |Γ| ≤ 1 cannot overflow.
  for (let i = 0; i < gammaMagnitude.length; i++) gammaMagnitude[i] = Math.sqrt(gammaRe[i] * gammaRe[i] + gammaIm[i] * gammaIm[i]);
  return { port, referenceOhms, frequenciesHz, gammaRe, gammaIm, gammaMagnitude };
}

/** Spp of a file (S11, S22, …), with every other port terminated in its reference impedance. */
export function reflectionCurveFromNetwork(network: TouchstoneNetwork, port = 1): ReflectionCurve {
  const series = sParameter(network, port, port);
  return reflectionCurveFromGamma(network.frequenciesHz, series.re, series.im, network.referenceOhms[port - 1], port);
}

export function gammaAtIndex(curve: ReflectionCurve, index: number): Complex {
  return complex(curve.gammaRe[index], curve.gammaIm[index]);
}

/** Port impedance Z = Z0 (1 + Γ)/(1 − Γ) at one sample. */
export function impedanceAtIndex(curve: ReflectionCurve, index: number): Complex {
  return impedanceFromGamma(gammaAtIndex(curve, index), curve.referenceOhms);
}

export function vswrSeries(curve: ReflectionCurve): Float64Array {
  return curve.gammaMagnitude.map(vswrFromGammaMagnitude);
}

export function returnLossDbSeries(curve: ReflectionCurve): Float64Array {
  return curve.gammaMagnitude.map(returnLossDbFromGammaMagnitude);
}

/** VSWR 2:1 (RL 9.54 dB) and |S11| ≤ −10 dB (VSWR 1.925) differ (Pozar 4th ed. §2.3). */
export type MatchCriterion = { readonly kind: 'vswr'; readonly maxVswr: number } | { readonly kind: 'return-loss'; readonly minReturnLossDb: number };

export const DEFAULT_MATCH_CRITERION: MatchCriterion = { kind: 'vswr', maxVswr: 2 };
export const RETURN_LOSS_10_DB_CRITERION: MatchCriterion = { kind: 'return-loss', minReturnLossDb: 10 };

export function gammaLimitOf(criterion: MatchCriterion): number {
  return criterion.kind === 'vswr' ? gammaMagnitudeFromVswr(criterion.maxVswr) : gammaMagnitudeFromReturnLossDb(criterion.minReturnLossDb);
}

/** Impedance bandwidth: the ranges where the criterion holds, edges interpolated on |Γ|. */
export function matchedRanges(curve: ReflectionCurve, criterion: MatchCriterion = DEFAULT_MATCH_CRITERION): FrequencyRange[] {
  return rangesAtMost(curve.frequenciesHz, curve.gammaMagnitude, gammaLimitOf(criterion));
}

export interface MatchPoint {
  readonly frequencyHz: number;
  readonly gammaMagnitude: number;
  readonly vswr: number;
  readonly returnLossDb: number;
}

function matchPoint(frequencyHz: number, gammaMagnitude: number): MatchPoint {
  return { frequencyHz, gammaMagnitude, vswr: vswrFromGammaMagnitude(gammaMagnitude), returnLossDb: returnLossDbFromGammaMagnitude(gammaMagnitude) };
}

/** The sample with the lowest |Γ| over the whole curve. */
export function bestMatch(curve: ReflectionCurve): MatchPoint {
  let best = 0;
  for (let i = 1; i < curve.gammaMagnitude.length; i++) if (curve.gammaMagnitude[i] < curve.gammaMagnitude[best]) best = i;
  return matchPoint(curve.frequenciesHz[best], curve.gammaMagnitude[best]);
}

function magnitudeCurve(curve: ReflectionCurve) {
  return { frequenciesHz: curve.frequenciesHz, values: curve.gammaMagnitude };
}

/** |Γ|, VSWR and return loss at any frequency inside the measured range. */
export function matchAt(curve: ReflectionCurve, frequencyHz: number): MatchPoint | undefined {
  const gammaMagnitude = interpolateAt(magnitudeCurve(curve), frequencyHz);
  return gammaMagnitude === undefined ? undefined : matchPoint(frequencyHz, gammaMagnitude);
}

/** The worst (highest) VSWR over the band, band edges interpolated. */
export function worstMatchInBand(curve: ReflectionCurve, band: FrequencyRange): BandResult<{ readonly worst: MatchPoint }> {
  const stats = bandStatistics(magnitudeCurve(curve), band);
  if (stats.status === 'no-data') return stats;
  return { status: 'ok', worst: matchPoint(stats.maxAtHz, stats.max) };
}

export interface BandMatch {
  readonly coveredFraction: number;
  readonly coveredRanges: readonly FrequencyRange[];
  readonly uncoveredRanges: readonly FrequencyRange[];
  readonly worst: MatchPoint;
  readonly gammaLimit: number;
}

/** Coverage of a band by the matched ranges, the gaps, and the worst point; "no data" if the band leaves the measured range. */
export function bandMatch(curve: ReflectionCurve, band: FrequencyRange, criterion: MatchCriterion = DEFAULT_MATCH_CRITERION): BandResult<BandMatch> {
  const worst = worstMatchInBand(curve, band);
  if (worst.status === 'no-data') return worst;
  const coverage = coverageOfBand(matchedRanges(curve, criterion), band);
  return { status: 'ok', ...coverage, worst: worst.worst, gammaLimit: gammaLimitOf(criterion) };
}
