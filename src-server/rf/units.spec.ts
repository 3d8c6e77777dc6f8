import {
  dbmToMw,
  dbToAmplitudeRatio,
  dbToPowerRatio,
  efficiencyDbToPercent,
  efficiencyPercentToDb,
  frequencyHzFromWavelengthM,
  mwToDbm,
  SPEED_OF_LIGHT_M_PER_S,
  wavelengthFractionMm,
  wavelengthM,
} from './units';

describe(wavelengthFractionMm.name, () => {
  // Computed with c = 299 792 458 m/s (BIPM SI Brochure, 9th ed.); 2-decimal rounding.
  const table: [number, number, number, number][] = [
    [900e6, 333.1, 166.55, 83.28],
    [1575.42e6, 190.29, 95.15, 47.57],
    [2.45e9, 122.36, 61.18, 30.59],
    [3e9, 99.93, 49.97, 24.98],
    [5.5e9, 54.51, 27.25, 13.63],
  ];
  it.each(table)('%d Hz: λ %d mm, λ/2 %d mm, λ/4 %d mm', (frequencyHz, full, half, quarter) => {
    expect(wavelengthFractionMm(frequencyHz)).toBeCloseTo(full, 1);
    expect(Math.abs(wavelengthFractionMm(frequencyHz, 0.5) - half)).toBeLessThanOrEqual(0.006);
    expect(Math.abs(wavelengthFractionMm(frequencyHz, 0.25) - quarter)).toBeLessThanOrEqual(0.006);
  });

  it('uses the exact SI value of c', () => {
    // BIPM SI Brochure, 9th ed.: c = 299 792 458 m/s exactly, so 1 GHz has λ = 0.299792458 m.
    expect(SPEED_OF_LIGHT_M_PER_S).toBe(299_792_458);
    expect(wavelengthM(1e9)).toBe(0.299792458);
    expect(frequencyHzFromWavelengthM(0.299792458)).toBeCloseTo(1e9, 3);
  });

  it('gives the λ/4 ground-plane lengths (common practice rule)', () => {
    expect(wavelengthFractionMm(617e6, 0.25)).toBeCloseTo(121.5, 1);
    expect(wavelengthFractionMm(699e6, 0.25)).toBeCloseTo(107.2, 1);
    expect(wavelengthFractionMm(2400e6, 0.25)).toBeCloseTo(31.2, 1);
  });
});

describe(efficiencyPercentToDb.name, () => {
  // Definition of the decibel; 2-decimal rounding.
  const table: [number, number][] = [
    [100, 0],
    [90, -0.46],
    [80, -0.97],
    [70, -1.55],
    [60, -2.22],
    [50, -3.01],
    [40, -3.98],
    [30, -5.23],
    [25, -6.02],
    [20, -6.99],
    [10, -10],
    [1, -20],
  ];
  it.each(table)('%d %% = %d dB', (percent, db) => {
    expect(efficiencyPercentToDb(percent)).toBeCloseTo(db, 2);
  });
});

describe(efficiencyDbToPercent.name, () => {
  // The reverse direction; 1-decimal rounding.
  it.each([
    [-1, 79.4],
    [-2, 63.1],
    [-3, 50.1],
    [-6, 25.1],
  ])('%d dB = %d %%', (db, percent) => {
    expect(efficiencyDbToPercent(db)).toBeCloseTo(percent, 1);
  });
});

describe(mwToDbm.name, () => {
  it('keeps regulators’ mW unrounded: 25 mW = 13.979 dBm (common practice)', () => {
    expect(mwToDbm(25)).toBeCloseTo(13.979, 3);
    expect(mwToDbm(25)).not.toBe(14);
  });
  it('1 W = 30 dBm and 500 mW = 26.99 dBm', () => {
    expect(mwToDbm(1000)).toBeCloseTo(30, 12);
    expect(mwToDbm(500)).toBeCloseTo(26.99, 2);
  });
});

describe(dbmToMw.name, () => {
  it('inverts mwToDbm and gives 10 dBm = 10 mW (definition of dBm)', () => {
    expect(dbmToMw(10)).toBeCloseTo(10, 12);
    expect(dbmToMw(mwToDbm(41))).toBeCloseTo(41, 12);
  });
});

describe(dbToPowerRatio.name, () => {
  it('gives 1.64 for the λ/2 dipole’s 2.15 dBi (Balanis 4th ed. §4.6)', () => {
    expect(dbToPowerRatio(2.15)).toBeCloseTo(1.64, 2);
  });
});

describe(dbToAmplitudeRatio.name, () => {
  it('−10 dB of |S11| is |Γ| 0.3162 (Pozar 4th ed. §2.3)', () => {
    expect(dbToAmplitudeRatio(-10)).toBeCloseTo(0.3162, 4);
  });
});
