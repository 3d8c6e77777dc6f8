import {
  type FrequencyRange,
  type SampledCurve,
  bandStatistics,
  combinedBandStatistics,
  coverageOfBand,
  efficiencyInBand,
  gainInBand,
  inMeasuredRange,
  interpolateAt,
  mergeRanges,
  segmentIndex,
} from '../../rf/curves';
import { type ReflectionCurve, matchedRanges } from '../../rf/reflection';
import { detuningMargin } from '../../rf/detuning';
import { gammaMagnitudeFromReturnLossDb, gammaMagnitudeFromVswr, returnLossDbFromGammaMagnitude, vswrFromGammaMagnitude } from '../../rf/mismatch';
import { eirpDbm, erpDbmFromEirpDbm, polarizationLossDb, totalEfficiency } from '../../rf/link-budget';
import {
  type GainBasis,
  efficiencyNeedsGamma,
  gainNeedsGamma,
  gainOfBasis,
  realizedGainAtRadioPortDbi,
  systemEfficiency,
  totalEfficiencyOfBasis,
} from '../../rf/figure-basis';
import { powerRatioToDb, wavelengthFractionMm } from '../../rf/units';
import { FACT_CATALOG, FACT_NAMES, type FactName } from './fact-catalog';
import type { BandRange, FactValue, Facts, PartEvaluationData, RadioBandRequirement, SpecBand } from './types';

type Source = 'measured' | 'spec';

/** One quantity over one range: its value at any frequency inside, and where it changes slope or steps. */
interface RangeSampler {
  readonly source: Source;
  at(frequencyHz: number): number;
  breakpointsHz(): readonly number[];
  /** The measured curve itself, so a single quantity goes straight to the RF module's band statistics. */
  readonly curve: SampledCurve | null;
}

type Worse = (a: number, b: number) => number;

/** Inside the measured range, with the RF module's edge slack (a band outside it is "no data"). */
function measuredCovers(curve: SampledCurve, range: FrequencyRange): boolean {
  return inMeasuredRange(curve.frequenciesHz, range.fromHz) && inMeasuredRange(curve.frequenciesHz, range.toHz);
}

const gammaCurves = new WeakMap<ReflectionCurve, SampledCurve>();

/** |Γ| of a reflection curve as a sampled curve, one object per curve however many bands ask. */
function gammaCurveOf(reflection: ReflectionCurve): SampledCurve {
  let curve = gammaCurves.get(reflection);
  if (!curve) {
    curve = { frequenciesHz: reflection.frequenciesHz, values: reflection.gammaMagnitude };
    gammaCurves.set(reflection, curve);
  }
  return curve;
}

/** A class, not closures: a catalogue ranking makes several per pair and mostly reads only `curve`. */
class MeasuredSampler implements RangeSampler {
  readonly source = 'measured' as const;

  constructor(
    readonly curve: SampledCurve,
    private readonly range: FrequencyRange,
  ) {}

  at(frequencyHz: number): number {
    return interpolateAt(this.curve, frequencyHz)!;
  }

  breakpointsHz(): number[] {
    const f = this.curve.frequenciesHz;
    const points: number[] = [];
    for (let i = segmentIndex(f, this.range.fromHz); i < f.length && f[i] < this.range.toHz; i++) if (f[i] > this.range.fromHz) points.push(f[i]);
    return points;
  }
}

function measuredSampler(curve: SampledCurve | null, range: FrequencyRange): RangeSampler | null {
  if (!curve || !measuredCovers(curve, range)) return null;
  return new MeasuredSampler(curve, range);
}

type SpecFigure = 'gamma' | 'efficiency' | 'radiation-efficiency' | 'gain';

interface UsableSpec {
  readonly usable: readonly SpecBand[];
  readonly merged: readonly FrequencyRange[];
}

const usableSpecs = new WeakMap<readonly SpecBand[], Partial<Record<SpecFigure, UsableSpec>>>();

/** The spec bands stating a figure and their merged union: per part, not per band asked. */
function usableSpecOf(specBands: readonly SpecBand[], figure: SpecFigure, value: (band: SpecBand) => number | null): UsableSpec {
  let byFigure = usableSpecs.get(specBands);
  if (!byFigure) {
    byFigure = {};
    usableSpecs.set(specBands, byFigure);
  }
  let spec = byFigure[figure];
  if (!spec) {
    const usable = specBands.filter((b) => value(b) !== null);
    spec = { usable, merged: mergeRanges(usable.map((b) => ({ fromHz: b.fromHz, toHz: b.toHz }))) };
    byFigure[figure] = spec;
  }
  return spec;
}

/** Spec bands hold one figure per range; where two overlap the worse one counts. Null unless they cover the whole range. */
function specSampler(
  specBands: readonly SpecBand[],
  range: FrequencyRange,
  figure: SpecFigure,
  value: (band: SpecBand) => number | null,
  worse: Worse,
): RangeSampler | null {
  if (specBands.length === 0) return null;
  const { usable, merged } = usableSpecOf(specBands, figure, value);
  if (usable.length === 0) return null;
  if (coverageOfBand(merged, range).uncoveredRanges.length > 0) return null;
  const breakpointsHz = () => {
    const points: number[] = [];
    for (const b of usable) {
      if (b.fromHz > range.fromHz && b.fromHz < range.toHz) points.push(b.fromHz);
      if (b.toHz > range.fromHz && b.toHz < range.toHz) points.push(b.toHz);
    }
    return points;
  };
  const at = (f: number): number => {
    let result = NaN;
    for (const b of usable) if (f >= b.fromHz && f <= b.toHz) result = Number.isNaN(result) ? value(b)! : worse(result, value(b)!);
    return result;
  };
  return { source: 'spec', at, breakpointsHz, curve: null };
}

function specGamma(band: SpecBand): number | null {
  if (band.maxVswr !== null) return gammaMagnitudeFromVswr(band.maxVswr);
  if (band.minReturnLossDb !== null) return gammaMagnitudeFromReturnLossDb(band.minReturnLossDb);
  return null;
}

const efficiencyPercentOf = (band: SpecBand) => band.efficiencyPercent;
const radiationEfficiencyPercentOf = (band: SpecBand) => (band.efficiencyBasis === 'radiation' ? band.efficiencyPercent : null);
const peakGainOf = (band: SpecBand) => band.peakGainDbi;

/** |Γ| over a range: the measured curve where it covers the range, else the spec bands' worst claim. */
function gammaSamplerOf(gammaCurve: SampledCurve | null, specBands: readonly SpecBand[], range: FrequencyRange): RangeSampler | null {
  return measuredSampler(gammaCurve, range) ?? specSampler(specBands, range, 'gamma', specGamma, Math.max);
}

function gammaSampler(part: PartEvaluationData, range: FrequencyRange): RangeSampler | null {
  return gammaSamplerOf(part.reflection ? gammaCurveOf(part.reflection) : null, part.specBands, range);
}

/** What total efficiency is worked out from: the part's efficiency curve with its basis, and its spec bands. */
export type EfficiencySource = Pick<PartEvaluationData, 'efficiencyPercent' | 'efficiencyBasis' | 'specBands'>;

/** Efficiency in % as stated, of whichever basis the source states: the measured curve, else the spec bands. */
function statedEfficiencySampler(part: EfficiencySource, range: FrequencyRange): RangeSampler | null {
  return measuredSampler(part.efficiencyPercent, range) ?? specSampler(part.specBands, range, 'efficiency', efficiencyPercentOf, Math.min);
}

/** Radiation efficiency where the data states it; null where it states total efficiency (radiation is then not known). */
function radiationEfficiencySampler(part: PartEvaluationData, range: FrequencyRange): RangeSampler | null {
  const measured = measuredSampler(part.efficiencyPercent, range);
  if (measured) return part.efficiencyBasis === 'radiation' ? measured : null;
  return specSampler(part.specBands, range, 'radiation-efficiency', radiationEfficiencyPercentOf, Math.min);
}

/** Gain in dBi as stated (peak or realized, as the source says): the measured curve, else the spec bands. */
function statedGainSampler(part: PartEvaluationData, range: FrequencyRange): RangeSampler | null {
  return measuredSampler(part.peakGainDbi, range) ?? specSampler(part.specBands, range, 'gain', peakGainOf, Math.max);
}

/** Another sampler's values changed point by point with |Γ| at the same frequency (e.g. radiation → total efficiency). */
class GammaAdjustedSampler implements RangeSampler {
  readonly curve = null;
  readonly source: Source;

  constructor(
    readonly base: RangeSampler,
    readonly gamma: RangeSampler,
    private readonly adjust: (value: number, gammaMagnitude: number) => number,
  ) {
    this.source = base.source;
  }

  at(frequencyHz: number): number {
    return this.adjust(this.base.at(frequencyHz), this.gamma.at(frequencyHz));
  }

  breakpointsHz(): number[] {
    return [...this.base.breakpointsHz(), ...this.gamma.breakpointsHz()];
  }
}

const overlapsRange = (band: SpecBand, range: FrequencyRange) => band.fromHz <= range.toHz && band.toHz >= range.fromHz;

/**
 * A stated sampler brought to one basis. Data already of that basis is used as it is; data of the other
 * basis needs |Γ| there, and without it the figure is unknown (null). Spec bands convert each by its own basis.
 */
function toBasis(
  specBands: readonly SpecBand[],
  stated: RangeSampler | null,
  range: FrequencyRange,
  gamma: RangeSampler | null,
  spec: { figure: SpecFigure; value: (band: SpecBand) => number | null; worse: Worse; needsGamma: (band: SpecBand) => boolean },
  measuredNeedsGamma: boolean,
  convert: (value: number, band: SpecBand | null, gammaMagnitude: number) => number,
): RangeSampler | null {
  if (!stated) return null;
  if (stated.source === 'measured') {
    if (!measuredNeedsGamma) return stated;
    return gamma ? new GammaAdjustedSampler(stated, gamma, (v, g) => convert(v, null, g)) : null;
  }
  const { usable } = usableSpecOf(specBands, spec.figure, spec.value);
  if (!usable.some((b) => overlapsRange(b, range) && spec.needsGamma(b))) return stated;
  if (!gamma) return null;
  const at = (f: number): number => {
    const g = gamma.at(f);
    let result = NaN;
    for (const b of usable) {
      if (f < b.fromHz || f > b.toHz) continue;
      const v = convert(spec.value(b)!, b, g);
      result = Number.isNaN(result) ? v : spec.worse(result, v);
    }
    return result;
  };
  return { source: 'spec', curve: null, at, breakpointsHz: () => [...stated.breakpointsHz(), ...gamma.breakpointsHz()] };
}

/** Whether a datasheet line with an efficiency over this range states only its band average. */
function statesOnlyAverage(specBands: readonly SpecBand[], range: FrequencyRange): boolean {
  const { usable } = usableSpecOf(specBands, 'efficiency', efficiencyPercentOf);
  return usable.some((b) => overlapsRange(b, range) && b.efficiencyStatistic === 'average');
}

const totalEfficiencyPercent = (efficiencyPercent: number, gammaMagnitude: number) => totalEfficiency(efficiencyPercent / 100, gammaMagnitude) * 100;

const EFFICIENCY_SPEC = {
  figure: 'efficiency' as const,
  value: efficiencyPercentOf,
  worse: Math.min,
  needsGamma: (b: SpecBand) => efficiencyNeedsGamma(b.efficiencyBasis),
};

/** Total efficiency in % (radiation × (1 − |Γ|²) for radiation data, total data as it is). */
function totalEfficiencySampler(part: EfficiencySource, stated: RangeSampler | null, range: FrequencyRange, gamma: RangeSampler | null): RangeSampler | null {
  return toBasis(
    part.specBands,
    stated,
    range,
    gamma,
    EFFICIENCY_SPEC,
    efficiencyNeedsGamma(part.efficiencyBasis),
    (v, band, g) => totalEfficiencyOfBasis(v / 100, band ? band.efficiencyBasis : part.efficiencyBasis, g) * 100,
  );
}

const gainSpec = (wanted: GainBasis) => ({
  figure: 'gain' as const,
  value: peakGainOf,
  worse: Math.max,
  needsGamma: (b: SpecBand) => gainNeedsGamma(b.gainBasis, wanted),
});
const GAIN_SPEC: Record<GainBasis, ReturnType<typeof gainSpec>> = { peak: gainSpec('peak'), realized: gainSpec('realized') };

/** Gain in dBi on the wanted basis: peak (the antenna's gain) or realized (G + 10 log10(1 − |Γ|²)). */
function gainSamplerAs(
  part: PartEvaluationData,
  stated: RangeSampler | null,
  range: FrequencyRange,
  gamma: RangeSampler | null,
  wanted: GainBasis,
): RangeSampler | null {
  return toBasis(part.specBands, stated, range, gamma, GAIN_SPEC[wanted], gainNeedsGamma(part.gainBasis, wanted), (v, band, g) =>
    gainOfBasis(v, band ? band.gainBasis : part.gainBasis, wanted, g),
  );
}

/** Peak gain over a range, for EIRP and the certified gain (antenna gain, mismatch not included). */
function peakGainSampler(part: PartEvaluationData, range: FrequencyRange): RangeSampler | null {
  return gainSamplerAs(part, statedGainSampler(part, range), range, gammaSampler(part, range), 'peak');
}

/** The samplers' values, combined point by point, as a curve over the range (edges included). */
function combinedCurve(range: FrequencyRange, samplers: readonly RangeSampler[], combine: (values: number[]) => number): SampledCurve {
  const points: number[] = [range.fromHz, range.toHz];
  for (const s of samplers) for (const f of s.breakpointsHz()) points.push(f);
  // A typed array sorts numerically; equal frequencies are then neighbours and kept once.
  const sorted = Float64Array.from(points).sort();
  let count = 0;
  for (let k = 0; k < sorted.length; k++) if (count === 0 || sorted[k] !== sorted[count - 1]) sorted[count++] = sorted[k];
  const frequenciesHz = sorted.slice(0, count);
  const values = new Float64Array(count);
  const at: number[] = new Array(samplers.length);
  for (let k = 0; k < count; k++) {
    for (let j = 0; j < samplers.length; j++) at[j] = samplers[j].at(frequenciesHz[k]);
    values[k] = combine(at);
  }
  return { frequenciesHz, values };
}

/** One quantity alone: its measured curve as it is, or its spec figures as a step curve over the range. */
function single(range: FrequencyRange, sampler: RangeSampler): SampledCurve {
  return sampler.curve ?? combinedCurve(range, [sampler], ([v]) => v);
}

interface Extreme {
  value: number;
  atHz: number;
}

interface RangeStats {
  min: Extreme;
  max: Extreme;
  average: number;
  widthHz: number;
}

/** Min, max and width-weighted average over several ranges; null when any range has no data. */
function acrossRanges(perRange: (RangeStats | null)[]): RangeStats | null {
  if (perRange.length === 0 || perRange.some((s) => s === null)) return null;
  const stats = perRange as RangeStats[];
  const totalWidth = stats.reduce((sum, s) => sum + s.widthHz, 0);
  const min = stats.reduce((best, s) => (s.min.value < best.value ? s.min : best), stats[0].min);
  const max = stats.reduce((best, s) => (s.max.value > best.value ? s.max : best), stats[0].max);
  const average =
    totalWidth === 0 ? stats.reduce((sum, s) => sum + s.average, 0) / stats.length : stats.reduce((sum, s) => sum + s.average * s.widthHz, 0) / totalWidth;
  return { min, max, average, widthHz: totalWidth };
}

function linearStats(curve: SampledCurve, range: FrequencyRange): RangeStats {
  const stats = bandStatistics(curve, range, 'linear');
  if (stats.status === 'no-data') throw new Error(`internal: combined curve misses its own range (${stats.reason})`);
  return {
    min: { value: stats.min, atHz: stats.minAtHz },
    max: { value: stats.max, atHz: stats.maxAtHz },
    average: stats.average,
    widthHz: range.toHz - range.fromHz,
  };
}

/** efficiencyInBand reports no frequency of its maximum; the minimum's stands there. */
function efficiencyStats(curve: SampledCurve, range: FrequencyRange): RangeStats {
  const eff = efficiencyInBand(curve, range);
  if (eff.status === 'no-data') throw new Error(`internal: combined curve misses its own range (${eff.reason})`);
  return {
    min: { value: eff.minPercent, atHz: eff.minAtHz },
    max: { value: eff.maxPercent, atHz: eff.minAtHz },
    average: eff.averagePercent,
    widthHz: range.toHz - range.fromHz,
  };
}

/** Total efficiency of two measured curves, on the union of their samples, without building the combined curve. */
function measuredTotalEfficiencyStats(efficiency: SampledCurve, gamma: SampledCurve, range: FrequencyRange): RangeStats {
  const stats = combinedBandStatistics(efficiency, gamma, range, totalEfficiencyPercent);
  if (stats.status === 'no-data') throw new Error(`internal: measured curves miss a range they cover (${stats.reason})`);
  return {
    min: { value: stats.min, atHz: stats.minAtHz },
    max: { value: stats.max, atHz: stats.minAtHz },
    average: stats.average,
    widthHz: range.toHz - range.fromHz,
  };
}

/** Statistics of a total-efficiency sampler; two measured curves go straight to the RF module's combined statistics. */
function totalEfficiencyStatsOf(sampler: RangeSampler | null, range: FrequencyRange): RangeStats | null {
  if (!sampler) return null;
  if (sampler instanceof GammaAdjustedSampler && sampler.base.curve && sampler.gamma.curve) {
    return measuredTotalEfficiencyStats(sampler.base.curve, sampler.gamma.curve, range);
  }
  return efficiencyStats(single(range, sampler), range);
}

/**
 * The lowest total efficiency (%) over one range, exactly as the facts count it (minTotalEfficiencyPct):
 * the catalogue search filters on this, so search, matrix and candidates share one definition. Null: not known.
 */
export function minTotalEfficiencyPctInRange(part: EfficiencySource, gammaCurve: SampledCurve | null, range: FrequencyRange): number | null {
  const gamma = gammaSamplerOf(gammaCurve, part.specBands, range);
  const stats = totalEfficiencyStatsOf(totalEfficiencySampler(part, statedEfficiencySampler(part, range), range, gamma), range);
  return stats ? roundFactValue(stats.min.value) : null;
}

function gainStats(curve: SampledCurve, range: FrequencyRange): RangeStats {
  const gain = gainInBand(curve, range);
  if (gain.status === 'no-data') throw new Error(`internal: combined curve misses its own range (${gain.reason})`);
  return {
    min: { value: gain.minDbi, atHz: gain.peakAtHz },
    max: { value: gain.peakDbi, atHz: gain.peakAtHz },
    average: gain.averageDbi,
    widthHz: range.toHz - range.fromHz,
  };
}

interface CoverageResult {
  fraction: number;
  uncovered: FrequencyRange[];
}

const matchedCache = new WeakMap<ReflectionCurve, Map<number, FrequencyRange[]>>();

/** A part's impedance bandwidth at one VSWR, worked out once per curve however many bands ask. */
function matchedRangesOf(curve: ReflectionCurve, maxVswr: number): FrequencyRange[] {
  let byVswr = matchedCache.get(curve);
  if (!byVswr) {
    byVswr = new Map();
    matchedCache.set(curve, byVswr);
  }
  let ranges = byVswr.get(maxVswr);
  if (!ranges) {
    ranges = matchedRanges(curve, { kind: 'vswr', maxVswr });
    byVswr.set(maxVswr, ranges);
  }
  return ranges;
}

function coverageAt(part: PartEvaluationData, ranges: readonly FrequencyRange[], maxVswr: number): CoverageResult | null {
  let coveredWidth = 0;
  let totalWidth = 0;
  let fractionSum = 0;
  const uncovered: FrequencyRange[] = [];
  const specMatched = usableSpecOf(part.specBands, 'gamma', specGamma).usable;
  let good: FrequencyRange[] | null = null;
  for (const range of ranges) {
    let fraction: number;
    let gaps: readonly FrequencyRange[];
    const reflection = part.reflection;
    if (reflection && measuredCovers(gammaCurveOf(reflection), range)) {
      const measured = coverageOfBand(matchedRangesOf(reflection, maxVswr), range);
      fraction = measured.coveredFraction;
      gaps = measured.uncoveredRanges;
    } else if (specMatched.length > 0) {
      const limit = gammaMagnitudeFromVswr(maxVswr);
      good ??= mergeRanges(specMatched.filter((b) => specGamma(b)! <= limit).map((b) => ({ fromHz: b.fromHz, toHz: b.toHz })));
      const coverage = coverageOfBand(good, range);
      fraction = coverage.coveredFraction;
      gaps = coverage.uncoveredRanges;
    } else {
      return null;
    }
    const width = range.toHz - range.fromHz;
    coveredWidth += fraction * width;
    totalWidth += width;
    fractionSum += fraction;
    uncovered.push(...gaps);
  }
  return { fraction: totalWidth === 0 ? fractionSum / ranges.length : coveredWidth / totalWidth, uncovered };
}

const mhz = (hz: number) => hz / 1e6;

function formatMhzValue(hz: number): string {
  return String(Math.round(hz / 1e3) / 1e3);
}

export function describeRanges(ranges: readonly FrequencyRange[]): string {
  if (ranges.length === 0) return 'none';
  return ranges.map((r) => (r.fromHz === r.toHz ? `${formatMhzValue(r.fromHz)} MHz` : `${formatMhzValue(r.fromHz)}–${formatMhzValue(r.toHz)} MHz`)).join(', ');
}

function transmitRanges(requirement: RadioBandRequirement): readonly BandRange[] {
  if (requirement.txPowerDbm === null) return [];
  const tx = requirement.ranges.filter((r) => r.role === 'uplink' || r.role === 'tdd' || r.role === 'transmit-receive');
  // A transmitting radio whose band names no transmit range: every range counts.
  return tx.length > 0 ? tx : requirement.ranges;
}

/** The transmit ranges cut to the channels the radio lists (when it lists any): where its power limits are judged. */
export function judgedTransmitRanges(requirement: RadioBandRequirement): readonly BandRange[] {
  const tx = transmitRanges(requirement);
  const channels = requirement.channels;
  if (!channels || channels.length === 0) return tx;
  return tx.flatMap((range) =>
    channels.flatMap((channel) => {
      const shared = overlap(range, channel);
      return shared ? [{ ...shared, role: range.role }] : [];
    }),
  );
}

/** The limits over the judged ranges, and the requirement's markets none of them governs. */
function limitsOnFile(requirement: RadioBandRequirement, judged: readonly BandRange[]): { count: number; missing: string[] | null } {
  const applicable = requirement.regulatoryLimits.filter((limit) => judged.some((r) => overlap(r, limit) !== null));
  if (requirement.txPowerDbm === null || !requirement.markets) return { count: applicable.length, missing: null };
  const missing = requirement.markets.filter((market) => !applicable.some((limit) => !limit.markets || limit.markets.includes(market)));
  return { count: applicable.length, missing };
}

function overlap(a: FrequencyRange, b: FrequencyRange): FrequencyRange | null {
  const fromHz = Math.max(a.fromHz, b.fromHz);
  const toHz = Math.min(a.toHz, b.toHz);
  if (fromHz < toHz || (fromHz === toHz && (a.fromHz === a.toHz || b.fromHz === b.toHz))) return { fromHz, toHz };
  return null;
}

function sortedSides(lengthMm: number, widthMm: number): [number, number] {
  return lengthMm >= widthMm ? [lengthMm, widthMm] : [widthMm, lengthMm];
}

/** missingData by bit mask (1 S11/VSWR, 2 efficiency, 4 gain), in that order: one string each, not one per pair. */
const MISSING_DATA_TEXT: readonly string[] = Array.from({ length: 8 }, (_, mask) => {
  const labels = ['S11/VSWR', 'efficiency', 'gain'].filter((_, bit) => (mask & (1 << bit)) !== 0);
  return labels.length === 0 ? 'none' : labels.join(', ');
});

/** Every catalogue fact, unknown: built once; each copy shares its shape, so property access stays fast over a whole catalogue. */
const BLANK_FACTS: Readonly<Record<FactName, FactValue>> = Object.fromEntries(FACT_NAMES.map((name) => [name, null])) as Record<FactName, FactValue>;

/** Every fact, unknown until set. */
function blankFacts(): Record<FactName, FactValue> {
  return { ...BLANK_FACTS };
}

/** The facts of the radio band alone (the catalogue's row scope). */
const ROW_FACT_NAMES: readonly FactName[] = FACT_NAMES.filter((name) => FACT_CATALOG[name].scope === 'row');

/** Row facts depend on the radio band only, so a matrix computes them once per row. */
export function computeRowFacts(requirement: RadioBandRequirement): Record<string, FactValue> {
  const lowestHz = Math.min(...requirement.ranges.map((r) => r.fromHz));
  const highestHz = Math.max(...requirement.ranges.map((r) => r.toHz));
  const product = requirement.productGroundPlane ? sortedSides(requirement.productGroundPlane.lengthMm, requirement.productGroundPlane.widthMm) : null;
  const quarterWaveMm = wavelengthFractionMm(lowestHz, 0.25);
  const onFile = limitsOnFile(requirement, judgedTransmitRanges(requirement));
  const facts: Partial<Record<FactName, FactValue>> = {
    technology: requirement.technology,
    designation: requirement.designation,
    bandLowestMhz: mhz(lowestHz),
    bandHighestMhz: mhz(highestHz),
    radioTransmits: requirement.txPowerDbm !== null,
    txPowerDbm: requirement.txPowerDbm,
    feedLossDb: requirement.feedLossDb,
    certifiedMaxGainDbi: requirement.certifiedMaxGainDbi,
    requiredPolarization: requirement.requiredPolarization,
    productGroundPlaneLengthMm: product ? product[0] : null,
    productGroundPlaneWidthMm: product ? product[1] : null,
    quarterWaveMm,
    groundPlaneVsQuarterWavePct: product ? (product[0] / quarterWaveMm) * 100 : null,
    regionalLimitCount: onFile.count,
    marketsWithoutLimitCount: onFile.missing ? onFile.missing.length : 0,
    marketsWithoutLimit: onFile.missing ? (onFile.missing.length > 0 ? onFile.missing.join(', ') : 'none') : null,
  };
  return roundFacts(facts) as Record<string, FactValue>;
}

/**
 * The facts of one (radio band × part) pair, from the part's curves where they cover a range and
 * from its spec bands otherwise. Anything unknown is null, so rules that need it report no data.
 */
export function computeFacts(
  requirement: RadioBandRequirement,
  part: PartEvaluationData,
  rowFacts: Record<string, FactValue> = computeRowFacts(requirement),
): Facts {
  if (requirement.ranges.length === 0) throw new RangeError(`band ${requirement.designation} has no frequency ranges`);
  const ranges = requirement.ranges;
  const sources = new Set<Source>();
  let missingMask = 0;

  const gammas = ranges.map((r) => gammaSampler(part, r));
  const efficiencies = ranges.map((r) => statedEfficiencySampler(part, r));
  const gains = ranges.map((r) => statedGainSampler(part, r));
  const note = (samplers: (RangeSampler | null)[], bit: number) => {
    for (const s of samplers) {
      if (s) sources.add(s.source);
      else missingMask |= bit;
    }
  };
  note(gammas, 1);
  note(efficiencies, 2);
  note(gains, 4);

  // Measured curves go to the RF statistics as they are; spec step curves and converted figures through combinedCurve.
  const gammaStats = acrossRanges(ranges.map((r, i) => (gammas[i] ? linearStats(single(r, gammas[i]!), r) : null)));
  const radiation = acrossRanges(
    ranges.map((r) => {
      const s = radiationEfficiencySampler(part, r);
      return s ? efficiencyStats(single(r, s), r) : null;
    }),
  );
  const total = acrossRanges(ranges.map((r, i) => totalEfficiencyStatsOf(totalEfficiencySampler(part, efficiencies[i], r, gammas[i]), r)));
  const gain = acrossRanges(
    ranges.map((r, i) => {
      const s = gainSamplerAs(part, gains[i], r, gammas[i], 'peak');
      return s ? gainStats(single(r, s), r) : null;
    }),
  );
  const realized = acrossRanges(
    ranges.map((r, i) => {
      const s = gainSamplerAs(part, gains[i], r, gammas[i], 'realized');
      return s ? linearStats(single(r, s), r) : null;
    }),
  );
  const at2 = coverageAt(part, ranges, 2);
  const at3 = coverageAt(part, ranges, 3);

  const tx = transmitRanges(requirement);
  const txGain =
    tx.length > 0
      ? acrossRanges(
          tx.map((r) => {
            const s = peakGainSampler(part, r);
            return s ? gainStats(single(r, s), r) : null;
          }),
        )
      : null;
  const txPeakGainDbi = txGain ? txGain.max.value : null;
  const eirp = requirement.txPowerDbm !== null && txPeakGainDbi !== null ? eirpDbm(requirement.txPowerDbm, txPeakGainDbi, requirement.feedLossDb) : null;
  // A market with no limit on file leaves the limit unknown ("not checked"), however the other markets fare.
  const regional = (rowFacts.marketsWithoutLimitCount as number | null) ? {} : regionalLimitFacts(requirement, part, judgedTransmitRanges(requirement));

  const evalBoard = part.evaluationGroundPlane ? sortedSides(part.evaluationGroundPlane.lengthMm, part.evaluationGroundPlane.widthMm) : null;
  const productLength = rowFacts.productGroundPlaneLengthMm as number | null;
  const productWidth = rowFacts.productGroundPlaneWidthMm as number | null;
  const polarizationLoss =
    requirement.requiredPolarization !== null && part.polarization !== null ? polarizationLossDb(part.polarization, requirement.requiredPolarization) : null;
  const missingKinds = (missingMask & 1) + ((missingMask >> 1) & 1) + ((missingMask >> 2) & 1);
  const knownKinds = 3 - missingKinds;

  const facts = blankFacts();
  for (const name of ROW_FACT_NAMES) facts[name] = rounded(rowFacts[name] ?? null);
  facts.reviewState = part.reviewState;
  facts.lifecycle = part.lifecycle;
  facts.partPolarization = part.polarization;
  facts.dataSource = sources.size === 0 ? 'none' : sources.size === 2 ? 'mixed' : [...sources][0];
  facts.dataCompletenessPct = rounded((knownKinds / 3) * 100);
  facts.missingData = MISSING_DATA_TEXT[missingMask];
  facts.coverageAtVswr2Pct = rounded(at2 ? at2.fraction * 100 : null);
  facts.uncoveredAtVswr2 = at2 ? describeRanges(at2.uncovered) : null;
  facts.coverageAtVswr3Pct = rounded(at3 ? at3.fraction * 100 : null);
  facts.uncoveredAtVswr3 = at3 ? describeRanges(at3.uncovered) : null;
  facts.worstVswr = rounded(gammaStats ? vswrFromGammaMagnitude(gammaStats.max.value) : null);
  facts.worstVswrAtMhz = rounded(gammaStats ? mhz(gammaStats.max.atHz) : null);
  facts.worstReturnLossDb = rounded(gammaStats ? returnLossDbFromGammaMagnitude(gammaStats.max.value) : null);
  facts.efficiencyFromBandAverage = efficiencies.some((s, i) => s !== null && s.source === 'spec' && statesOnlyAverage(part.specBands, ranges[i]));
  facts.minRadiationEfficiencyPct = rounded(radiation ? radiation.min.value : null);
  facts.minRadiationEfficiencyAtMhz = rounded(radiation ? mhz(radiation.min.atHz) : null);
  facts.avgRadiationEfficiencyPct = rounded(radiation ? radiation.average : null);
  facts.minTotalEfficiencyPct = rounded(total ? total.min.value : null);
  facts.minTotalEfficiencyAtMhz = rounded(total ? mhz(total.min.atHz) : null);
  facts.avgTotalEfficiencyPct = rounded(total ? total.average : null);
  facts.avgTotalEfficiencyDb = rounded(total ? powerRatioToDb(total.average / 100) : null);
  // The feed loss is one factor over the band, so it scales the minimum and the average alike.
  facts.minSystemEfficiencyPct = rounded(total ? systemEfficiency(total.min.value, requirement.feedLossDb) : null);
  facts.minSystemEfficiencyAtMhz = rounded(total ? mhz(total.min.atHz) : null);
  facts.avgSystemEfficiencyPct = rounded(total ? systemEfficiency(total.average, requirement.feedLossDb) : null);
  facts.peakGainDbi = rounded(gain ? gain.max.value : null);
  facts.peakGainAtMhz = rounded(gain ? mhz(gain.max.atHz) : null);
  facts.realizedPeakGainDbi = rounded(realized ? realized.max.value : null);
  facts.realizedGainAtRadioPortDbi = rounded(realized ? realizedGainAtRadioPortDbi(realized.max.value, requirement.feedLossDb) : null);
  facts.txPeakGainDbi = rounded(txPeakGainDbi);
  facts.gainOverCertifiedDb = rounded(
    txPeakGainDbi !== null && requirement.certifiedMaxGainDbi !== null ? txPeakGainDbi - requirement.certifiedMaxGainDbi : null,
  );
  facts.eirpDbm = rounded(eirp);
  facts.erpDbm = rounded(eirp === null ? null : erpDbmFromEirpDbm(eirp));
  facts.regionalLimitDbm = rounded(regional.regionalLimitDbm ?? null);
  facts.regionalLimitKind = regional.regionalLimitKind ?? null;
  facts.regionalLimitRegion = regional.regionalLimitRegion ?? null;
  facts.regionalLimitSource = regional.regionalLimitSource ?? null;
  facts.regionalRadiatedDbm = rounded(regional.regionalRadiatedDbm ?? null);
  facts.regionalLimitMarginDb = rounded(regional.regionalLimitMarginDb ?? null);
  facts.evalGroundPlaneKnown = evalBoard !== null;
  facts.evalGroundPlaneLengthMm = rounded(evalBoard ? evalBoard[0] : null);
  facts.evalGroundPlaneWidthMm = rounded(evalBoard ? evalBoard[1] : null);
  facts.groundPlaneVsEvalPct = rounded(
    evalBoard && productLength !== null && productWidth !== null ? Math.min(productLength / evalBoard[0], productWidth / evalBoard[1]) * 100 : null,
  );
  facts.polarizationLossDb = rounded(polarizationLoss);
  const detuning = detuningFacts(part, ranges);
  facts.detuningMarginKnown = detuning !== null;
  facts.detuningMarginDownPct = rounded(detuning ? detuning.downPct : null);
  facts.detuningMarginUpPct = rounded(detuning ? detuning.upPct : null);
  // Every number above went through rounded(): a loop over all facts here cost a fifth of a catalogue ranking.
  return facts;
}

/** The VSWR the detuning margin holds the band at: the band-coverage rule's (rules/band-coverage.json). */
const DETUNING_VSWR = 3;

/** The smallest detuning margin over the band's ranges, from the measured S11 only; null when any range lacks it or fails unshifted. */
function detuningFacts(part: PartEvaluationData, ranges: readonly BandRange[]): { downPct: number; upPct: number } | null {
  const reflection = part.reflection;
  if (!reflection) return null;
  const curve = gammaCurveOf(reflection);
  const f = reflection.frequenciesHz;
  const measured = { fromHz: f[0], toHz: f[f.length - 1] };
  let downPct = Infinity;
  let upPct = Infinity;
  for (const range of ranges) {
    if (!measuredCovers(curve, range)) return null;
    const margin = detuningMargin(matchedRangesOf(reflection, DETUNING_VSWR), range, measured);
    if (!margin) return null;
    downPct = Math.min(downPct, margin.downPct);
    upPct = Math.min(upPct, margin.upPct);
  }
  return { downPct, upPct };
}

/**
 * To 1e-9 of the unit (facts are dB, %, MHz, mm: far below 1e6): a value that sits on a threshold
 * (VSWR 2 from |Γ| = 1/3) stays on it instead of 4e-16 over.
 */
export function roundFactValue(value: number): number {
  if (!Number.isFinite(value) || Math.abs(value) >= 1e6) return value;
  return Math.round(value * 1e9) / 1e9;
}

/** roundFactValue for numbers; anything else as it is. */
function rounded<T extends FactValue | undefined>(value: T): T {
  return (typeof value === 'number' ? roundFactValue(value) : value) as T;
}

function roundFacts<T extends Partial<Record<FactName, FactValue>>>(facts: T): T {
  for (const name in facts) {
    const value = facts[name];
    if (typeof value === 'number') (facts as Record<string, FactValue>)[name] = roundFactValue(value);
  }
  return facts;
}

/** The tightest regional limit over the transmit ranges; margin null when the gain there is unknown. */
function regionalLimitFacts(requirement: RadioBandRequirement, part: PartEvaluationData, tx: readonly BandRange[]): Partial<Record<FactName, FactValue>> {
  const empty = {
    regionalLimitDbm: null,
    regionalLimitKind: null,
    regionalLimitRegion: null,
    regionalLimitSource: null,
    regionalRadiatedDbm: null,
    regionalLimitMarginDb: null,
  };
  if (requirement.txPowerDbm === null) return empty;
  let tightest: Partial<Record<FactName, FactValue>> | null = null;
  let tightestMargin = Infinity;
  let unknown: Partial<Record<FactName, FactValue>> | null = null;
  for (const limit of requirement.regulatoryLimits) {
    for (const range of tx) {
      const shared = overlap(range, limit);
      if (!shared) continue;
      const base = { regionalLimitDbm: limit.valueDbm, regionalLimitKind: limit.kind, regionalLimitRegion: limit.region, regionalLimitSource: limit.source };
      if (limit.kind === 'conducted') {
        // Conducted power at the radio's port (e.g. a UE power class): the antenna's gain plays no part.
        const margin = limit.valueDbm - requirement.txPowerDbm;
        if (margin < tightestMargin) {
          tightestMargin = margin;
          tightest = { ...base, regionalRadiatedDbm: requirement.txPowerDbm, regionalLimitMarginDb: margin };
        }
        continue;
      }
      const sampler = peakGainSampler(part, shared);
      if (!sampler) {
        unknown ??= { ...base, regionalRadiatedDbm: null, regionalLimitMarginDb: null };
        continue;
      }
      const peak = gainStats(single(shared, sampler), shared).max.value;
      const eirp = eirpDbm(requirement.txPowerDbm, peak, requirement.feedLossDb);
      let radiated: number;
      let allowed = limit.valueDbm;
      if (limit.kind === 'conducted-gain-rule') {
        // e.g. 47 CFR 15.247(b)(4): conducted power reduced by (G − 6 dBi) × 1 dB/dB above 6 dBi; compared at the radio's port.
        radiated = requirement.txPowerDbm;
        allowed = limit.valueDbm - Math.max(0, peak - (limit.gainThresholdDbi ?? Infinity)) * (limit.reductionDbPerDb ?? 1);
      } else {
        radiated = limit.kind === 'erp' ? erpDbmFromEirpDbm(eirp) : eirp;
      }
      const margin = allowed - radiated;
      if (margin < tightestMargin) {
        tightestMargin = margin;
        tightest = { ...base, regionalLimitDbm: allowed, regionalRadiatedDbm: radiated, regionalLimitMarginDb: margin };
      }
    }
  }
  // An unknown gain under any limit makes the verdict unknown, even if another limit is met.
  return unknown ?? tightest ?? empty;
}
