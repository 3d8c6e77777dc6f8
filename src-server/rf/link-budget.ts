import { powerRatioToDb, SPEED_OF_LIGHT_M_PER_S } from './units';
import { transmittedFractionFromGammaMagnitude } from './mismatch';

/** Gain of a λ/2 dipole over isotropic, the step between ERP and EIRP. ITU RR Art. 1 No. 1.161-1.163. */
export const HALF_WAVE_DIPOLE_GAIN_DBI = 2.15;

/** G = η_rad × D (both linear). IEEE Std 145-2013; Balanis, Antenna Theory 4th ed. §2.14. */
export function gainFromEfficiencyAndDirectivity(radiationEfficiency: number, directivity: number): number {
  return radiationEfficiency * directivity;
}

export function gainDbiFromEfficiencyPercentAndDirectivityDbi(efficiencyPercent: number, directivityDbi: number): number {
  return powerRatioToDb(efficiencyPercent / 100) + directivityDbi;
}

/** Realized gain includes the mismatch: G_r = G (1 − |Γ|²). */
export function realizedGainDbi(gainDbi: number, gammaMagnitude: number): number {
  return gainDbi + powerRatioToDb(transmittedFractionFromGammaMagnitude(gammaMagnitude));
}

/** η_tot = η_rad (1 − |Γ|²), as fractions 0..1. */
export function totalEfficiency(radiationEfficiency: number, gammaMagnitude: number): number {
  return radiationEfficiency * transmittedFractionFromGammaMagnitude(gammaMagnitude);
}

export function eirpDbm(txPowerDbm: number, peakGainDbi: number, feedLossDb = 0): number {
  return txPowerDbm + peakGainDbi - feedLossDb;
}

export function erpDbmFromEirpDbm(eirp: number): number {
  return eirp - HALF_WAVE_DIPOLE_GAIN_DBI;
}

export function eirpDbmFromErpDbm(erp: number): number {
  return erp + HALF_WAVE_DIPOLE_GAIN_DBI;
}

/** Friis free-space path loss 20 log10(4π d f / c); far field only. Friis, Proc. IRE 34 (1946). */
export function freeSpacePathLossDb(frequencyHz: number, distanceM: number): number {
  return 20 * Math.log10((4 * Math.PI * distanceM * frequencyHz) / SPEED_OF_LIGHT_M_PER_S);
}

/** Distance at which the free-space path loss reaches the given value. */
export function distanceMForPathLossDb(frequencyHz: number, pathLossDb: number): number {
  return (10 ** (pathLossDb / 20) * SPEED_OF_LIGHT_M_PER_S) / (4 * Math.PI * frequencyHz);
}

/** Free-space range scales with 10^(ΔdB/20): +6 dB doubles it, −6 dB halves it. */
export function rangeRatioFromDbDifference(differenceDb: number): number {
  return 10 ** (differenceDb / 20);
}

/** As the API and the database spell them (parts and radios). */
export const POLARIZATIONS = ['linear', 'RHCP', 'LHCP'] as const;
export type Polarization = (typeof POLARIZATIONS)[number];

/**
 * Polarization loss for a matched-direction link (Balanis 4th ed. §2.12): linear↔circular 3.01 dB,
 * opposite circular senses reject entirely (Infinity), linear↔linear cos² of the tilt angle.
 */
export function polarizationLossDb(antenna: Polarization, signal: Polarization, linearTiltDeg = 0): number {
  if (antenna === signal) {
    if (antenna !== 'linear') return 0;
    const cosTilt = Math.cos((linearTiltDeg * Math.PI) / 180);
    return -powerRatioToDb(cosTilt * cosTilt);
  }
  if (antenna === 'linear' || signal === 'linear') return -powerRatioToDb(0.5);
  return Infinity;
}

export interface LinkBudgetInput {
  readonly frequencyHz: number;
  readonly distanceM: number;
  readonly txPowerDbm: number;
  readonly txGainDbi: number;
  readonly rxGainDbi: number;
  /** Every fixed loss in the link besides free-space path loss (feeds, cables, polarization, body). */
  readonly lossesDb: number;
  readonly rxSensitivityDbm: number;
  /** Loss between the transmitter and its antenna; counts against EIRP. Defaults to 0. */
  readonly txFeedLossDb?: number;
}

export interface LinkBudget {
  readonly eirpDbm: number;
  readonly erpDbm: number;
  readonly pathLossDb: number;
  readonly receivedDbm: number;
  readonly marginDb: number;
  /** Free-space distance at which the margin falls to 0 dB. */
  readonly maxRangeM: number;
}

/** A free-space link budget; `txFeedLossDb` and `lossesDb` add up, so give each loss once. */
export function linkBudget(input: LinkBudgetInput): LinkBudget {
  const txFeedLossDb = input.txFeedLossDb ?? 0;
  const eirp = eirpDbm(input.txPowerDbm, input.txGainDbi, txFeedLossDb);
  const pathLossDb = freeSpacePathLossDb(input.frequencyHz, input.distanceM);
  const receivedDbm = eirp - pathLossDb - input.lossesDb + input.rxGainDbi;
  const marginDb = receivedDbm - input.rxSensitivityDbm;
  return {
    eirpDbm: eirp,
    erpDbm: erpDbmFromEirpDbm(eirp),
    pathLossDb,
    receivedDbm,
    marginDb,
    maxRangeM: distanceMForPathLossDb(input.frequencyHz, pathLossDb + marginDb),
  };
}
