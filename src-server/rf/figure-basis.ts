import { powerRatioToDb, dbToPowerRatio } from './units';
import { transmittedFractionFromGammaMagnitude } from './mismatch';
import { realizedGainDbi, totalEfficiency } from './link-budget';

/**
 * What an efficiency or gain figure includes (IEEE Std 145-2013 terms, from memory):
 * radiation efficiency and gain leave the mismatch out, total efficiency and realized gain include it.
 */
export const EFFICIENCY_BASES = ['radiation', 'total'] as const;
export type EfficiencyBasis = (typeof EFFICIENCY_BASES)[number];

/** `peak`: the antenna's gain, mismatch not included; `realized`: realized gain, mismatch included (G_r = G (1 − |Γ|²)). */
export const GAIN_BASES = ['peak', 'realized'] as const;
export type GainBasis = (typeof GAIN_BASES)[number];

/** Whether a datasheet figure is the lowest value over its band or the band's average. */
export const FIGURE_STATISTICS = ['minimum', 'average'] as const;
export type FigureStatistic = (typeof FIGURE_STATISTICS)[number];

/** Whether converting a figure of this basis to total efficiency needs |Γ|. */
export const efficiencyNeedsGamma = (basis: EfficiencyBasis) => basis === 'radiation';

/**
 * Total efficiency (fraction 0..1) from a figure of either basis: radiation × (1 − |Γ|²) (Pozar 4th ed. §2.3;
 * IEEE Std 145-2013), a total figure as it is, since it already holds the mismatch.
 */
export function totalEfficiencyOfBasis(efficiency: number, basis: EfficiencyBasis, gammaMagnitude: number): number {
  return basis === 'radiation' ? totalEfficiency(efficiency, gammaMagnitude) : efficiency;
}

/** Whether converting a gain of this basis to `wanted` needs |Γ|. */
export const gainNeedsGamma = (basis: GainBasis, wanted: GainBasis) => basis !== wanted;

/**
 * A gain of one basis as the other: realized = peak + 10 log10(1 − |Γ|²), and back. The same basis as it is.
 */
export function gainOfBasis(gainDbi: number, basis: GainBasis, wanted: GainBasis, gammaMagnitude: number): number {
  if (basis === wanted) return gainDbi;
  if (wanted === 'realized') return realizedGainDbi(gainDbi, gammaMagnitude);
  return gainDbi - powerRatioToDb(transmittedFractionFromGammaMagnitude(gammaMagnitude));
}

/** Efficiency seen at the radio port through a feed or cable of `feedLossDb`: η_sys = η_tot × 10^(−L/10). */
export function systemEfficiency(totalEfficiencyValue: number, feedLossDb: number): number {
  return totalEfficiencyValue * dbToPowerRatio(-feedLossDb);
}

/** Realized gain seen at the radio port: G_r − L (dB). */
export function realizedGainAtRadioPortDbi(realizedGain: number, feedLossDb: number): number {
  return realizedGain - feedLossDb;
}
