import type { FrequencyRange } from './curves';

/**
 * Detuning margin: how far an antenna's S11 curve may shift in frequency (as the enclosure, battery, hand or
 * body shift its resonance) before a band stops meeting the match limit.
 *
 * A downward shift by δ moves a feature at f0 to f0·(1 − δ), so the shifted curve meets the limit over the band
 * exactly where the original meets it over [f1/(1 − δ), f2/(1 − δ)]; upward, over [f1/(1 + δ), f2/(1 + δ)].
 * Linear interpolation commutes with that scaling of the frequency axis, so the margin is exact for the curve
 * as stored: it is read off the matched range that holds the band.
 */
export interface DetuningMargin {
  /** Largest downward shift (resonance moves lower) that keeps the whole band matched, in %. */
  readonly downPct: number;
  /** Largest upward shift that keeps the whole band matched, in %. */
  readonly upPct: number;
  /** True where the matched range reaches the end of the measured data: the true margin may be larger. */
  readonly downLimitedByData: boolean;
  readonly upLimitedByData: boolean;
}

/**
 * The margin of one band given the curve's matched ranges (sorted, disjoint; see matchedRanges) and its measured
 * span; null when no single matched range holds the whole band (the band fails before any shift).
 */
export function detuningMargin(matched: readonly FrequencyRange[], band: FrequencyRange, measured: FrequencyRange): DetuningMargin | null {
  const holding = findHoldingRange(matched, band);
  if (!holding) return null;
  return {
    downPct: (1 - band.toHz / holding.toHz) * 100,
    upPct: (band.fromHz / holding.fromHz - 1) * 100,
    downLimitedByData: holding.toHz >= measured.toHz,
    upLimitedByData: holding.fromHz <= measured.fromHz,
  };
}

/** The matched range that holds [fromHz, toHz] whole, by binary search over the sorted ranges. */
function findHoldingRange(matched: readonly FrequencyRange[], band: FrequencyRange): FrequencyRange | null {
  let low = 0;
  let high = matched.length - 1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    const range = matched[middle];
    if (range.toHz < band.fromHz) low = middle + 1;
    else if (range.fromHz > band.fromHz) high = middle - 1;
    else return range.toHz >= band.toHz ? range : null;
  }
  return null;
}
