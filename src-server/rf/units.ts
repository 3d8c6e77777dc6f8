/** Speed of light in vacuum, exact by definition of the metre. BIPM SI Brochure, 9th ed. */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

export function wavelengthM(frequencyHz: number): number {
  return SPEED_OF_LIGHT_M_PER_S / frequencyHz;
}

/** A fraction of the free-space wavelength in mm, e.g. fraction 0.25 for λ/4. */
export function wavelengthFractionMm(frequencyHz: number, fraction = 1): number {
  return wavelengthM(frequencyHz) * 1000 * fraction;
}

export function frequencyHzFromWavelengthM(wavelengthMetres: number): number {
  return SPEED_OF_LIGHT_M_PER_S / wavelengthMetres;
}

export function powerRatioToDb(powerRatio: number): number {
  return 10 * Math.log10(powerRatio);
}

export function dbToPowerRatio(db: number): number {
  return 10 ** (db / 10);
}

export function dbToAmplitudeRatio(db: number): number {
  return 10 ** (db / 20);
}

export function mwToDbm(powerMw: number): number {
  return 10 * Math.log10(powerMw);
}

export function dbmToMw(powerDbm: number): number {
  return 10 ** (powerDbm / 10);
}

export function dbmToWatts(powerDbm: number): number {
  return dbmToMw(powerDbm) / 1000;
}

/** Efficiency is a power ratio: 50 % → −3.01 dB. */
export function efficiencyPercentToDb(efficiencyPercent: number): number {
  return powerRatioToDb(efficiencyPercent / 100);
}

export function efficiencyDbToPercent(efficiencyDb: number): number {
  return dbToPowerRatio(efficiencyDb) * 100;
}
