import { gammaMagnitudeFromVswr } from './mismatch';
import {
  distanceMForPathLossDb,
  eirpDbm,
  eirpDbmFromErpDbm,
  erpDbmFromEirpDbm,
  freeSpacePathLossDb,
  gainDbiFromEfficiencyPercentAndDirectivityDbi,
  gainFromEfficiencyAndDirectivity,
  linkBudget,
  polarizationLossDb,
  rangeRatioFromDbDifference,
  realizedGainDbi,
  totalEfficiency,
} from './link-budget';
import { dbmToMw, mwToDbm, powerRatioToDb } from './units';

describe(gainFromEfficiencyAndDirectivity.name, () => {
  // IEEE Std 145-2013 (from memory); Balanis, Antenna Theory 4th ed. §2.14, §4.2, §4.6.
  it('η 50 % × λ/2 dipole (1.64) → 0.82 = −0.86 dBi', () => {
    expect(gainFromEfficiencyAndDirectivity(0.5, 1.64)).toBeCloseTo(0.82, 2);
    expect(gainDbiFromEfficiencyPercentAndDirectivityDbi(50, 2.15)).toBeCloseTo(-0.86, 2);
  });
  it('η 70 % × short dipole (1.5) → 1.05 = +0.21 dBi', () => {
    expect(gainFromEfficiencyAndDirectivity(0.7, 1.5)).toBeCloseTo(1.05, 2);
    expect(powerRatioToDb(gainFromEfficiencyAndDirectivity(0.7, 1.5))).toBeCloseTo(0.21, 2);
  });
  it('η 25 % isotropic → −6.02 dBi', () => {
    expect(gainDbiFromEfficiencyPercentAndDirectivityDbi(25, 0)).toBeCloseTo(-6.02, 2);
  });
});

describe(totalEfficiency.name, () => {
  // η_tot = η_rad (1 − |Γ|²).
  it.each([
    [0.6, 2, 53.3, -2.73],
    [0.5, 3, 37.5, -4.26],
    [0.7, 1.5, 67.2, -1.73],
  ])('η_rad %d at VSWR %d → %d %% (%d dB)', (eta, vswr, percent, db) => {
    const total = totalEfficiency(eta, gammaMagnitudeFromVswr(vswr));
    expect(total * 100).toBeCloseTo(percent, 1);
    expect(powerRatioToDb(total)).toBeCloseTo(db, 2);
  });
});

describe(realizedGainDbi.name, () => {
  it('subtracts the mismatch loss: VSWR 2 costs 0.512 dB (Pozar 4th ed. §2.3)', () => {
    expect(realizedGainDbi(2, gammaMagnitudeFromVswr(2))).toBeCloseTo(2 - 0.512, 3);
  });
});

describe(erpDbmFromEirpDbm.name, () => {
  // EIRP = ERP + 2.15 dB (ITU RR Art. 1, from memory; 2.15 dB corroborated).
  it.each([
    [5, 9.14],
    [10, 12.15],
    [25, 16.13],
    [500, 29.14],
  ])('%d mW e.r.p. = %d dBm e.i.r.p.', (erpMw, eirp) => {
    expect(eirpDbmFromErpDbm(mwToDbm(erpMw))).toBeCloseTo(eirp, 2);
    expect(erpDbmFromEirpDbm(eirp)).toBeCloseTo(mwToDbm(erpMw), 2);
  });
  it('10 mW e.r.p. is 16.4 mW e.i.r.p. and 25 mW is 41.0 mW', () => {
    expect(dbmToMw(eirpDbmFromErpDbm(mwToDbm(10)))).toBeCloseTo(16.4, 1);
    expect(dbmToMw(eirpDbmFromErpDbm(mwToDbm(25)))).toBeCloseTo(41.0, 1);
  });
});

describe(eirpDbm.name, () => {
  it('1 W DTS with a 6 dBi antenna is 36 dBm e.i.r.p. (47 CFR 15.247(b)(4))', () => {
    expect(eirpDbm(30, 6)).toBe(36);
    // (b)(4): with 12 dBi the conducted power drops to 24 dBm and the EIRP stays 36 dBm.
    expect(eirpDbm(24, 12)).toBe(36);
  });
  it('subtracts the feed loss', () => {
    expect(eirpDbm(20, 3, 1.5)).toBeCloseTo(21.5, 12);
  });
});

describe(freeSpacePathLossDb.name, () => {
  // Friis, Proc. IRE 34 (1946); 2 decimals.
  it.each([
    [868e6, 1, 31.22],
    [868e6, 10, 51.22],
    [868e6, 1000, 91.22],
    [2.4e9, 1, 40.05],
    [2.4e9, 10, 60.05],
    [2.4e9, 1000, 100.05],
    [5.8e9, 1, 47.72],
    [5.8e9, 10, 67.72],
    [5.8e9, 1000, 107.72],
  ])('%d Hz at %d m: %d dB', (frequencyHz, distanceM, db) => {
    expect(freeSpacePathLossDb(frequencyHz, distanceM)).toBeCloseTo(db, 2);
  });
  it('matches ITU-R P.525 32.45 + 20 log f_MHz + 20 log d_km within its rounding (from memory)', () => {
    expect(freeSpacePathLossDb(868e6, 1000)).toBeCloseTo(32.45 + 20 * Math.log10(868) + 20 * Math.log10(1), 1);
  });
});

describe(rangeRatioFromDbDifference.name, () => {
  it('every 6 dB halves free-space range (product brief; Friis, Proc. IRE 34 (1946): L ∝ d²)', () => {
    expect(rangeRatioFromDbDifference(-6)).toBeCloseTo(0.5, 2);
    expect(rangeRatioFromDbDifference(20 * Math.log10(2))).toBeCloseTo(2, 12);
  });
  it('agrees with the path-loss formula: +6.02 dB of loss is double the distance', () => {
    const d = distanceMForPathLossDb(2.4e9, freeSpacePathLossDb(2.4e9, 100) + 20 * Math.log10(2));
    expect(d).toBeCloseTo(200, 9);
  });
});

describe(polarizationLossDb.name, () => {
  it('linear antenna for an RHCP signal ≈ 3 dB (Balanis 4th ed. §2.12)', () => {
    expect(polarizationLossDb('linear', 'RHCP')).toBeCloseTo(3.01, 2);
    expect(polarizationLossDb('RHCP', 'RHCP')).toBe(0);
    expect(polarizationLossDb('LHCP', 'RHCP')).toBe(Infinity);
    expect(polarizationLossDb('linear', 'linear', 45)).toBeCloseTo(3.01, 2);
  });
});

describe(linkBudget.name, () => {
  it('composes EIRP, Friis and margin, and its max range has zero margin', () => {
    const input = { frequencyHz: 868e6, distanceM: 1000, txPowerDbm: 14, txGainDbi: 2, rxGainDbi: 0, lossesDb: 3, rxSensitivityDbm: -120 };
    const budget = linkBudget(input);
    expect(budget.eirpDbm).toBe(16);
    expect(budget.erpDbm).toBeCloseTo(13.85, 12);
    expect(budget.pathLossDb).toBeCloseTo(91.22, 2);
    expect(budget.receivedDbm).toBeCloseTo(16 - 91.22 - 3, 2);
    expect(budget.marginDb).toBeCloseTo(120 + 16 - 91.22 - 3, 2);
    expect(linkBudget({ ...input, distanceM: budget.maxRangeM }).marginDb).toBeCloseTo(0, 9);
  });
});
