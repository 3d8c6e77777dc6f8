import { type BandResult, type FrequencyRange, type SampledCurve, combinedBandStatistics, interpolateAt } from './curves';
import { type EfficiencyBasis, type GainBasis, gainOfBasis } from './figure-basis';
import { efficiencyPercentToDb, powerRatioToDb } from './units';

/**
 * Directivity implied by a gain and an efficiency on the same basis: G = η_rad·D and G_r = η_tot·D
 * (IEEE Std 145-2013, from memory; Balanis, Antenna Theory, 4th ed., §2.14), so D = G / η.
 */

/** Directivity of a short (Hertzian) dipole, 1.5 = 1.76 dBi (Balanis, Antenna Theory, 4th ed., §4.2): no real antenna is less directive. */
export const SHORT_DIPOLE_DIRECTIVITY = 1.5;
export const SHORT_DIPOLE_DIRECTIVITY_DBI = powerRatioToDb(SHORT_DIPOLE_DIRECTIVITY);

/** The gain that pairs with an efficiency: radiation efficiency with the antenna's gain, total efficiency with realized gain. */
export const GAIN_BASIS_OF_EFFICIENCY: Readonly<Record<EfficiencyBasis, GainBasis>> = { radiation: 'peak', total: 'realized' };

/**
 * D (dBi) = G (dBi) − η (dB), with the gain first brought to the efficiency's basis (needs |Γ| when the bases differ).
 * Null when the bases differ and |Γ| is unknown, or the efficiency is not above zero.
 */
export function impliedDirectivityDbi(
  gainDbi: number,
  gainBasis: GainBasis,
  efficiencyPercent: number,
  efficiencyBasis: EfficiencyBasis,
  gammaMagnitude: number | null,
): number | null {
  if (!(efficiencyPercent > 0)) return null;
  const wanted = GAIN_BASIS_OF_EFFICIENCY[efficiencyBasis];
  if (wanted !== gainBasis && gammaMagnitude === null) return null;
  return gainOfBasis(gainDbi, gainBasis, wanted, gammaMagnitude ?? 0) - efficiencyPercentToDb(efficiencyPercent);
}

export interface DirectivityInBand {
  readonly maxDbi: number;
  readonly maxAtHz: number;
  readonly minDbi: number;
  readonly minAtHz: number;
}

/**
 * Implied directivity frequency by frequency from a measured gain curve (dBi) and efficiency curve (%), over the band,
 * with the rf band statistics (edges interpolated, both curves' samples inside). When the bases differ the gain is
 * converted with |Γ| from `gammaMagnitude` at each frequency of the gain curve; without it the result is no data.
 */
export function impliedDirectivityInBand(
  gain: SampledCurve,
  gainBasis: GainBasis,
  efficiency: SampledCurve,
  efficiencyBasis: EfficiencyBasis,
  band: FrequencyRange,
  gammaMagnitude: SampledCurve | null,
): BandResult<DirectivityInBand> | { readonly status: 'bases-differ' } {
  const wanted = GAIN_BASIS_OF_EFFICIENCY[efficiencyBasis];
  let onBasis = gain;
  if (wanted !== gainBasis) {
    if (!gammaMagnitude) return { status: 'bases-differ' };
    const values = new Float64Array(gain.values.length);
    for (let i = 0; i < values.length; i++) {
      const gamma = interpolateAt(gammaMagnitude, gain.frequenciesHz[i]);
      // A gain sample outside the S11's range cannot be converted: NaN is never a new minimum or maximum.
      values[i] = gamma === undefined ? NaN : gainOfBasis(gain.values[i], gainBasis, wanted, gamma);
    }
    onBasis = { frequenciesHz: gain.frequenciesHz, values };
  }
  const stats = combinedBandStatistics(onBasis, efficiency, band, (g, eta) => (eta > 0 ? g - efficiencyPercentToDb(eta) : NaN));
  if (stats.status === 'no-data') return stats;
  if (!Number.isFinite(stats.max) || !Number.isFinite(stats.min)) return { status: 'bases-differ' };
  return { status: 'ok', maxDbi: stats.max, maxAtHz: stats.maxAtHz, minDbi: stats.min, minAtHz: stats.minAtHz };
}

export type DirectivityVerdict = 'below-dipole' | 'above-form-factor' | 'plausible';

/** Below a short dipole's 1.76 dBi or above the plausible ceiling: the gain and efficiency figures cannot both be right. */
export function judgeDirectivity(directivityDbi: number, plausibleMaxDbi: number): DirectivityVerdict {
  if (directivityDbi < SHORT_DIPOLE_DIRECTIVITY_DBI) return 'below-dipole';
  if (directivityDbi > plausibleMaxDbi) return 'above-form-factor';
  return 'plausible';
}
