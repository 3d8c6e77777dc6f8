/**
 * Curves sampled over frequency. Interpolation is linear in frequency on the quantity as tabulated:
 * efficiency in %, gain in dBi, and for reflection |Γ| (see reflection.ts), never on dB of |Γ|.
 * Outside the measured range nothing is extrapolated: results say "no data".
 */

export interface FrequencyRange {
  readonly fromHz: number;
  readonly toHz: number;
}

export interface SampledCurve {
  /** Strictly increasing. */
  readonly frequenciesHz: ArrayLike<number>;
  readonly values: ArrayLike<number>;
}

/** Why a band has no result: a constant to branch on; the sentence in `reason` is written on first read. */
export type NoDataCode = 'no-points' | 'below-range' | 'above-range';

export interface NoData {
  readonly status: 'no-data';
  readonly code: NoDataCode;
  readonly reason: string;
}

export type BandResult<T> = ({ readonly status: 'ok' } & T) | NoData;

/** Relative slack when comparing band edges with the measured range, so 699 MHz read from "0.699 GHz" still counts. */
const EDGE_TOLERANCE = 1e-12;

function checkBand(band: FrequencyRange): void {
  if (!(Number.isFinite(band.fromHz) && Number.isFinite(band.toHz) && band.fromHz <= band.toHz)) {
    throw new RangeError(`a band needs finite edges with fromHz <= toHz, got ${band.fromHz}..${band.toHz}`);
  }
}

function formatMhz(frequencyHz: number): string {
  return `${Number((frequencyHz / 1e6).toPrecision(9))} MHz`;
}

/** A NoData whose sentence is built only when someone reads it (a catalogue scan asks millions of bands). */
function noData(code: NoDataCode, describe: () => string): NoData {
  let reason: string | undefined;
  const result = { status: 'no-data' as const, code, reason: '' };
  // Enumerable, so JSON responses and toMatchObject still see the sentence.
  Object.defineProperty(result, 'reason', { enumerable: true, get: () => (reason ??= describe()) });
  return result;
}

/** "no data" when the band is not wholly inside the measured range; null when it is. */
export function bandOutsideData(frequenciesHz: ArrayLike<number>, band: FrequencyRange): NoData | null {
  checkBand(band);
  const count = frequenciesHz.length;
  if (count === 0) return noData('no-points', () => 'the curve has no points');
  const first = frequenciesHz[0];
  const last = frequenciesHz[count - 1];
  const slack = EDGE_TOLERANCE * Math.max(Math.abs(first), Math.abs(last));
  const measured = () => `${formatMhz(first)}–${formatMhz(last)}`;
  if (band.fromHz < first - slack) return noData('below-range', () => `the band starts at ${formatMhz(band.fromHz)}, below the measured range ${measured()}`);
  if (band.toHz > last + slack) return noData('above-range', () => `the band ends at ${formatMhz(band.toHz)}, above the measured range ${measured()}`);
  return null;
}

/** Index i with f[i] <= frequencyHz < f[i + 1] (clamped to 0..n − 2). */
export function segmentIndex(frequenciesHz: ArrayLike<number>, frequencyHz: number): number {
  let low = 0;
  let high = frequenciesHz.length - 1;
  while (high - low > 1) {
    const middle = (low + high) >>> 1;
    if (frequenciesHz[middle] <= frequencyHz) low = middle;
    else high = middle;
  }
  return low;
}

/** Whether interpolateAt has a value there: inside the measured range, within its 1e-12 relative slack. */
export function inMeasuredRange(frequenciesHz: ArrayLike<number>, frequencyHz: number): boolean {
  const n = frequenciesHz.length;
  if (n === 0) return false;
  const slack = EDGE_TOLERANCE * Math.max(Math.abs(frequenciesHz[0]), Math.abs(frequenciesHz[n - 1]));
  return !(frequencyHz < frequenciesHz[0] - slack || frequencyHz > frequenciesHz[n - 1] + slack);
}

/** Linear interpolation; undefined outside the measured range (within a 1e-12 relative slack at the ends). */
export function interpolateAt(curve: SampledCurve, frequencyHz: number): number | undefined {
  const f = curve.frequenciesHz;
  const n = f.length;
  if (!inMeasuredRange(f, frequencyHz)) return undefined;
  if (n === 1) return curve.values[0];
  if (frequencyHz <= f[0]) return curve.values[0];
  if (frequencyHz >= f[n - 1]) return curve.values[n - 1];
  const i = segmentIndex(f, frequencyHz);
  const t = (frequencyHz - f[i]) / (f[i + 1] - f[i]);
  return curve.values[i] + t * (curve.values[i + 1] - curve.values[i]);
}

/** Values at the given frequencies; NaN where outside the measured range. */
export function resample(curve: SampledCurve, frequenciesHz: ArrayLike<number>): Float64Array {
  const out = new Float64Array(frequenciesHz.length);
  for (let k = 0; k < frequenciesHz.length; k++) out[k] = interpolateAt(curve, frequenciesHz[k]) ?? NaN;
  return out;
}

/** `count` evenly spaced frequencies from fromHz to toHz inclusive. */
export function evenlySpacedFrequencies(fromHz: number, toHz: number, count: number): Float64Array {
  const out = new Float64Array(count);
  if (count === 1) {
    out[0] = fromHz;
    return out;
  }
  for (let k = 0; k < count; k++) out[k] = fromHz + ((toHz - fromHz) * k) / (count - 1);
  out[count - 1] = toHz;
  return out;
}

/** The samples inside the band, with interpolated values at both edges. */
export function sliceBand(curve: SampledCurve, band: FrequencyRange): { frequenciesHz: number[]; values: number[] } {
  const f = curve.frequenciesHz;
  const frequenciesHz = [band.fromHz];
  const values = [interpolateAt(curve, band.fromHz)!];
  for (let i = 0; i < f.length; i++) {
    if (f[i] > band.fromHz && f[i] < band.toHz) {
      frequenciesHz.push(f[i]);
      values.push(curve.values[i]);
    }
  }
  if (band.toHz > band.fromHz) {
    frequenciesHz.push(band.toHz);
    values.push(interpolateAt(curve, band.toHz)!);
  }
  return { frequenciesHz, values };
}

export type Averaging = 'linear' | 'power-of-db';

export interface BandStatistics {
  readonly min: number;
  readonly minAtHz: number;
  readonly max: number;
  readonly maxAtHz: number;
  /** Mean over frequency (trapezoidal, so uneven spacing is weighted fairly). */
  readonly average: number;
}

/**
 * Min, max and frequency-weighted average over [fromHz, toHz] with interpolated edges.
 * 'power-of-db' averages dB values as linear power and returns dB (for gains in dBi); values
 * already in linear power (efficiency in %) use 'linear', which is then the power average.
 */
export function bandStatistics(curve: SampledCurve, band: FrequencyRange, averaging: Averaging = 'linear'): BandResult<BandStatistics> {
  const outside = bandOutsideData(curve.frequenciesHz, band);
  if (outside) return outside;
  const slice = sliceBand(curve, band);
  let min = Infinity;
  let max = -Infinity;
  let minAtHz = band.fromHz;
  let maxAtHz = band.fromHz;
  for (let k = 0; k < slice.values.length; k++) {
    const value = slice.values[k];
    if (value < min) {
      min = value;
      minAtHz = slice.frequenciesHz[k];
    }
    if (value > max) {
      max = value;
      maxAtHz = slice.frequenciesHz[k];
    }
  }
  const toAveraged = averaging === 'linear' ? (v: number) => v : (v: number) => 10 ** (v / 10);
  let average: number;
  if (slice.values.length === 1) {
    average = toAveraged(slice.values[0]);
  } else {
    let area = 0;
    for (let k = 0; k + 1 < slice.values.length; k++) {
      area += ((toAveraged(slice.values[k]) + toAveraged(slice.values[k + 1])) / 2) * (slice.frequenciesHz[k + 1] - slice.frequenciesHz[k]);
    }
    average = area / (band.toHz - band.fromHz);
  }
  if (averaging === 'power-of-db') average = 10 * Math.log10(average);
  return { status: 'ok', min, minAtHz, max, maxAtHz, average };
}

export interface EfficiencyInBand {
  readonly minPercent: number;
  readonly minAtHz: number;
  readonly maxPercent: number;
  /** Power average over frequency. */
  readonly averagePercent: number;
  readonly minDb: number;
  readonly averageDb: number;
}

export function efficiencyInBand(curvePercent: SampledCurve, band: FrequencyRange): BandResult<EfficiencyInBand> {
  const stats = bandStatistics(curvePercent, band, 'linear');
  if (stats.status === 'no-data') return stats;
  return {
    status: 'ok',
    minPercent: stats.min,
    minAtHz: stats.minAtHz,
    maxPercent: stats.max,
    averagePercent: stats.average,
    minDb: 10 * Math.log10(stats.min / 100),
    averageDb: 10 * Math.log10(stats.average / 100),
  };
}

export interface GainInBand {
  readonly peakDbi: number;
  readonly peakAtHz: number;
  readonly minDbi: number;
  /** Averaged as linear power, shown in dBi. */
  readonly averageDbi: number;
}

export function gainInBand(curveDbi: SampledCurve, band: FrequencyRange): BandResult<GainInBand> {
  const stats = bandStatistics(curveDbi, band, 'power-of-db');
  if (stats.status === 'no-data') return stats;
  return { status: 'ok', peakDbi: stats.max, peakAtHz: stats.maxAtHz, minDbi: stats.min, averageDbi: stats.average };
}

/**
 * Frequency ranges where the curve is at most `limit`, with edges found by linear interpolation
 * between the samples either side. An isolated sample on the limit yields a zero-width range.
 */
export function rangesAtMost(frequenciesHz: ArrayLike<number>, values: ArrayLike<number>, limit: number): FrequencyRange[] {
  const ranges: FrequencyRange[] = [];
  const n = frequenciesHz.length;
  let openFromHz = NaN;
  let inside = false;
  for (let i = 0; i < n; i++) {
    const ok = values[i] <= limit;
    if (ok && !inside) {
      openFromHz = i === 0 ? frequenciesHz[0] : crossing(frequenciesHz, values, i - 1, limit);
      inside = true;
    } else if (!ok && inside) {
      ranges.push({ fromHz: openFromHz, toHz: crossing(frequenciesHz, values, i - 1, limit) });
      inside = false;
    }
  }
  if (inside) ranges.push({ fromHz: openFromHz, toHz: frequenciesHz[n - 1] });
  return ranges;
}

function crossing(f: ArrayLike<number>, v: ArrayLike<number>, i: number, limit: number): number {
  const t = (limit - v[i]) / (v[i + 1] - v[i]);
  return f[i] + t * (f[i + 1] - f[i]);
}

export interface Coverage {
  /** Share of the band's width inside the ranges, 0..1; a zero-width band counts 1 when its frequency is inside. */
  readonly coveredFraction: number;
  readonly coveredRanges: readonly FrequencyRange[];
  readonly uncoveredRanges: readonly FrequencyRange[];
}

/** How much of the band the (sorted, disjoint) ranges cover, and the gaps left. */
export function coverageOfBand(ranges: readonly FrequencyRange[], band: FrequencyRange): Coverage {
  checkBand(band);
  const coveredRanges: FrequencyRange[] = [];
  for (const range of ranges) {
    const fromHz = Math.max(range.fromHz, band.fromHz);
    const toHz = Math.min(range.toHz, band.toHz);
    if (fromHz <= toHz) coveredRanges.push({ fromHz, toHz });
  }
  const uncoveredRanges: FrequencyRange[] = [];
  let cursor = band.fromHz;
  for (const range of coveredRanges) {
    if (range.fromHz > cursor) uncoveredRanges.push({ fromHz: cursor, toHz: range.fromHz });
    cursor = Math.max(cursor, range.toHz);
  }
  if (cursor < band.toHz) uncoveredRanges.push({ fromHz: cursor, toHz: band.toHz });
  const width = band.toHz - band.fromHz;
  const coveredWidth = coveredRanges.reduce((sum, r) => sum + (r.toHz - r.fromHz), 0);
  const coveredFraction = width === 0 ? (coveredRanges.length > 0 ? 1 : 0) : Math.min(1, coveredWidth / width);
  return { coveredFraction, coveredRanges, uncoveredRanges: width === 0 && coveredRanges.length === 0 ? [band] : uncoveredRanges };
}
