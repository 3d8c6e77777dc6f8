import { type FrequencyRange, type SampledCurve, coverageOfBand, efficiencyInBand, gainInBand } from '../../rf/curves';
import { type ReflectionCurve, bandMatch, matchedRanges } from '../../rf/reflection';
import { returnLossDbFromVswr } from '../../rf/mismatch';
import { type SpecBandClaim, claimedMaxVswr, mergeRanges, overlappingBands, specBandsCover } from '../spec-coverage';
import type { EfficiencyBasis } from '../../rf/figure-basis';

export interface PartCurves {
  readonly s11: ReflectionCurve | null;
  readonly efficiencyPercent: SampledCurve | null;
  /** What the measured efficiency curve includes; null read as radiation, the basis data had before it was stated. */
  readonly efficiencyBasis?: EfficiencyBasis | null;
  readonly peakGainDbi: SampledCurve | null;
  readonly averageGainDbi: SampledCurve | null;
  readonly specBands: readonly SpecBandClaim[];
}

export interface RangeFigures {
  fromMhz: number;
  toMhz: number;
  matchSource: 'measured' | 'spec' | 'no-data';
  coveredFractionVswr2: number | null;
  worstVswr: number | null;
  worstVswrAtMhz: number | null;
  minReturnLossDb: number | null;
  efficiencySource: 'measured' | 'spec' | 'no-data';
  /** What the efficiency figures include, as the data states it: radiation, total, or mixed (spec bands of both). */
  efficiencyBasis: EfficiencyBasis | 'mixed' | null;
  minEfficiencyPct: number | null;
  averageEfficiencyPct: number | null;
  averageEfficiencyDb: number | null;
  peakGainDbi: number | null;
  averageGainDbi: number | null;
  notes: string[];
}

const mhz = (hz: number) => hz / 1e6;

/** The figures of one range from the measured curves (RF module), else from the spec bands that span it. */
export function figuresForRange(curves: PartCurves, range: FrequencyRange): RangeFigures {
  const figures: RangeFigures = {
    fromMhz: mhz(range.fromHz),
    toMhz: mhz(range.toHz),
    matchSource: 'no-data',
    coveredFractionVswr2: null,
    worstVswr: null,
    worstVswrAtMhz: null,
    minReturnLossDb: null,
    efficiencySource: 'no-data',
    efficiencyBasis: null,
    minEfficiencyPct: null,
    averageEfficiencyPct: null,
    averageEfficiencyDb: null,
    peakGainDbi: null,
    averageGainDbi: null,
    notes: [],
  };
  const spec = overlappingBands(curves.specBands, range);

  const match = curves.s11 ? bandMatch(curves.s11, range, { kind: 'vswr', maxVswr: 2 }) : null;
  if (match && match.status === 'ok') {
    figures.matchSource = 'measured';
    figures.coveredFractionVswr2 = match.coveredFraction;
    figures.worstVswr = match.worst.vswr;
    figures.worstVswrAtMhz = mhz(match.worst.frequencyHz);
    figures.minReturnLossDb = match.worst.returnLossDb;
  } else {
    if (match) figures.notes.push(`S11: ${match.reason}`);
    const claimed = spec.filter((b) => claimedMaxVswr(b) !== null);
    if (claimed.length > 0 && specBandsCover(claimed, range, () => true)) {
      figures.matchSource = 'spec';
      const worst = Math.max(...claimed.map((b) => claimedMaxVswr(b)!));
      figures.worstVswr = worst;
      figures.minReturnLossDb = returnLossDbFromVswr(worst);
      const atTwo = mergeRanges(claimed.filter((b) => claimedMaxVswr(b)! <= 2));
      figures.coveredFractionVswr2 = coverageOfBand(atTwo, range).coveredFraction;
    } else if (!match) {
      figures.notes.push('S11: no measured curve and no spec band spans the range');
    }
  }

  const efficiency = curves.efficiencyPercent ? efficiencyInBand(curves.efficiencyPercent, range) : null;
  if (efficiency && efficiency.status === 'ok') {
    figures.efficiencySource = 'measured';
    figures.efficiencyBasis = curves.efficiencyBasis ?? 'radiation';
    figures.minEfficiencyPct = efficiency.minPercent;
    figures.averageEfficiencyPct = efficiency.averagePercent;
    figures.averageEfficiencyDb = efficiency.averageDb;
  } else {
    if (efficiency) figures.notes.push(`Efficiency: ${efficiency.reason}`);
    const claimed = spec.filter((b) => b.efficiencyPct !== null);
    if (claimed.length > 0 && specBandsCover(claimed, range, () => true)) {
      figures.efficiencySource = 'spec';
      const bases = new Set(claimed.map((b) => b.efficiencyBasis));
      figures.efficiencyBasis = bases.size === 1 ? [...bases][0] : 'mixed';
      figures.minEfficiencyPct = Math.min(...claimed.map((b) => b.efficiencyPct!));
    } else if (!efficiency) {
      figures.notes.push('Efficiency: no measured curve and no spec band spans the range');
    }
  }

  const peak = curves.peakGainDbi ? gainInBand(curves.peakGainDbi, range) : null;
  if (peak && peak.status === 'ok') figures.peakGainDbi = peak.peakDbi;
  else {
    if (peak) figures.notes.push(`Peak gain: ${peak.reason}`);
    const claimed = spec.filter((b) => b.peakGainDbi !== null);
    if (claimed.length > 0) figures.peakGainDbi = Math.max(...claimed.map((b) => b.peakGainDbi!));
  }
  const average = curves.averageGainDbi ? gainInBand(curves.averageGainDbi, range) : null;
  if (average && average.status === 'ok') figures.averageGainDbi = average.averageDbi;
  else {
    if (average) figures.notes.push(`Average gain: ${average.reason}`);
    const claimed = spec.filter((b) => b.averageGainDbi !== null);
    if (claimed.length > 0) figures.averageGainDbi = Math.min(...claimed.map((b) => b.averageGainDbi!));
  }
  return figures;
}

export interface CoveredRange {
  fromMhz: number;
  toMhz: number;
  source: 'measured' | 'spec';
}

/** Where the part is matched to VSWR ≤ maxVswr: the measured S11's intervals, else its spec bands that claim it. */
export function coveredRangesOf(curves: PartCurves, maxVswr = 2): CoveredRange[] {
  if (curves.s11) {
    return matchedRanges(curves.s11, { kind: 'vswr', maxVswr }).map((r) => ({ fromMhz: mhz(r.fromHz), toMhz: mhz(r.toHz), source: 'measured' as const }));
  }
  return curves.specBands
    .filter((band) => {
      const v = claimedMaxVswr(band);
      return v !== null && v <= maxVswr;
    })
    .map((band) => ({ fromMhz: mhz(band.fromHz), toMhz: mhz(band.toHz), source: 'spec' as const }));
}
