import type { FrequencyRange } from '../rf/curves';
import { vswrFromReturnLossDb } from '../rf/mismatch';
import type { EfficiencyBasis, FigureStatistic, GainBasis } from '../rf/figure-basis';

/** A datasheet band in Hz, as the search index and the figures use it. */
export interface SpecBandClaim {
  readonly fromHz: number;
  readonly toHz: number;
  readonly maxVswr: number | null;
  readonly minReturnLossDb: number | null;
  readonly efficiencyPct: number | null;
  readonly efficiencyBasis: EfficiencyBasis;
  readonly efficiencyStatistic: FigureStatistic;
  readonly peakGainDbi: number | null;
  readonly averageGainDbi: number | null;
  readonly gainBasis: GainBasis;
}

/** The VSWR a spec band promises: its max VSWR, else the one its minimum return loss implies, else unknown. */
export function claimedMaxVswr(band: SpecBandClaim): number | null {
  if (band.maxVswr !== null) return band.maxVswr;
  if (band.minReturnLossDb !== null) return vswrFromReturnLossDb(band.minReturnLossDb);
  return null;
}

/** Sorted, merged union of ranges; ranges that touch are joined. */
export function mergeRanges(ranges: readonly FrequencyRange[]): FrequencyRange[] {
  const sorted = [...ranges].sort((a, b) => a.fromHz - b.fromHz);
  const merged: { fromHz: number; toHz: number }[] = [];
  for (const range of sorted) {
    const last = merged[merged.length - 1];
    if (last && range.fromHz <= last.toHz) last.toHz = Math.max(last.toHz, range.toHz);
    else merged.push({ fromHz: range.fromHz, toHz: range.toHz });
  }
  return merged;
}

/** True when the union of the bands that satisfy `accept` contains the whole range. */
export function specBandsCover(bands: readonly SpecBandClaim[], range: FrequencyRange, accept: (band: SpecBandClaim) => boolean): boolean {
  const union = mergeRanges(bands.filter(accept));
  return union.some((r) => r.fromHz <= range.fromHz && r.toHz >= range.toHz);
}

/** The spec bands that overlap the range (a band touching only an edge counts). */
export function overlappingBands(bands: readonly SpecBandClaim[], range: FrequencyRange): SpecBandClaim[] {
  return bands.filter((b) => b.fromHz <= range.toHz && b.toHz >= range.fromHz);
}
