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
 * Min, max and frequency-weighted average of points fed in frequency order: the one place these
 * statistics are computed. 'power-of-db' compares dB values but averages them as linear power.
 */
export class BandStatisticsAccumulator {
  min = Infinity;
  max = -Infinity;
  minAtHz: number;
  maxAtHz: number;
  private area = 0;
  private count = 0;
  private lastHz = NaN;
  private lastAveraged = NaN;

  constructor(
    private readonly band: FrequencyRange,
    private readonly averaging: Averaging = 'linear',
  ) {
    this.minAtHz = band.fromHz;
    this.maxAtHz = band.fromHz;
  }

  add(frequencyHz: number, value: number): void {
    if (value < this.min) {
      this.min = value;
      this.minAtHz = frequencyHz;
    }
    if (value > this.max) {
      this.max = value;
      this.maxAtHz = frequencyHz;
    }
    const averaged = this.averaging === 'linear' ? value : 10 ** (value / 10);
    // Trapezoids, so uneven spacing is weighted fairly.
    if (this.count > 0) this.area += ((this.lastAveraged + averaged) / 2) * (frequencyHz - this.lastHz);
    this.count += 1;
    this.lastHz = frequencyHz;
    this.lastAveraged = averaged;
  }

  get average(): number {
    const mean = this.count === 1 ? this.lastAveraged : this.area / (this.band.toHz - this.band.fromHz);
    return this.averaging === 'linear' ? mean : 10 * Math.log10(mean);
  }

  result(): { readonly status: 'ok' } & BandStatistics {
    return { status: 'ok', min: this.min, minAtHz: this.minAtHz, max: this.max, maxAtHz: this.maxAtHz, average: this.average };
  }
}

/** First sample index strictly above frequencyHz (binary search). */
export function firstIndexAbove(frequenciesHz: ArrayLike<number>, frequencyHz: number): number {
  let i = segmentIndex(frequenciesHz, frequencyHz);
  while (i < frequenciesHz.length && frequenciesHz[i] <= frequencyHz) i++;
  return i;
}

/**
 * Min, max and frequency-weighted average over [fromHz, toHz]: the values at both edges (interpolated)
 * and the samples strictly inside, without copying them.
 * 'power-of-db' averages dB values as linear power and returns dB (for gains in dBi); values
 * already in linear power (efficiency in %) use 'linear', which is then the power average.
 */
export function bandStatistics(curve: SampledCurve, band: FrequencyRange, averaging: Averaging = 'linear'): BandResult<BandStatistics> {
  const outside = bandOutsideData(curve.frequenciesHz, band);
  if (outside) return outside;
  const f = curve.frequenciesHz;
  const stats = new BandStatisticsAccumulator(band, averaging);
  stats.add(band.fromHz, interpolateAt(curve, band.fromHz)!);
  for (let i = firstIndexAbove(f, band.fromHz); i < f.length && f[i] < band.toHz; i++) stats.add(f[i], curve.values[i]);
  if (band.toHz > band.fromHz) stats.add(band.toHz, interpolateAt(curve, band.toHz)!);
  return stats.result();
}

/**
 * bandStatistics of combine(a(f), b(f)) over the band: at the edges and at the union of both curves'
 * samples inside, merged in order, without building the combined curve.
 */
export function combinedBandStatistics(
  a: SampledCurve,
  b: SampledCurve,
  band: FrequencyRange,
  combine: (valueA: number, valueB: number) => number,
  averaging: Averaging = 'linear',
): BandResult<BandStatistics> {
  const outside = bandOutsideData(a.frequenciesHz, band) ?? bandOutsideData(b.frequenciesHz, band);
  if (outside) return outside;
  const stats = new BandStatisticsAccumulator(band, averaging);
  const fa = a.frequenciesHz;
  const fb = b.frequenciesHz;
  const at = (frequencyHz: number) => combine(interpolateAt(a, frequencyHz)!, interpolateAt(b, frequencyHz)!);
  stats.add(band.fromHz, at(band.fromHz));
  let i = firstIndexAbove(fa, band.fromHz);
  let j = firstIndexAbove(fb, band.fromHz);
  for (;;) {
    const nextA = i < fa.length && fa[i] < band.toHz ? fa[i] : Infinity;
    const nextB = j < fb.length && fb[j] < band.toHz ? fb[j] : Infinity;
    const next = Math.min(nextA, nextB);
    if (next === Infinity) break;
    stats.add(next, at(next));
    if (nextA === next) i++;
    if (nextB === next) j++;
  }
  if (band.toHz > band.fromHz) stats.add(band.toHz, at(band.toHz));
  return stats.result();
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

/** The union of ranges, sorted and disjoint (touching ranges join), as coverageOfBand takes them. */
export function mergeRanges(ranges: readonly FrequencyRange[]): FrequencyRange[] {
  const sorted = [...ranges].sort((a, b) => a.fromHz - b.fromHz);
  const merged: FrequencyRange[] = [];
  for (const r of sorted) {
    const last = merged[merged.length - 1];
    if (last && r.fromHz <= last.toHz) merged[merged.length - 1] = { fromHz: last.fromHz, toHz: Math.max(last.toHz, r.toHz) };
    else merged.push({ fromHz: r.fromHz, toHz: r.toHz });
  }
  return merged;
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
