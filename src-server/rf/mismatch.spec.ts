import { angleDeg, complex, magnitude } from './complex';
import {
  gammaFromImpedance,
  gammaMagnitudeFromReturnLossDb,
  gammaMagnitudeFromVswr,
  impedanceFromGamma,
  mismatchLossDbFromGammaMagnitude,
  reflectedFractionFromGammaMagnitude,
  returnLossDbFromGammaMagnitude,
  returnLossDbFromVswr,
  summarizeReflection,
  transmittedFractionFromGammaMagnitude,
  vswrFromGammaMagnitude,
  vswrFromReturnLossDb,
} from './mismatch';

describe(gammaMagnitudeFromVswr.name, () => {
  // Pozar, Microwave Engineering 4th ed., §2.3 (|Γ| 4 decimals, dB 2, %: 2, ML 3).
  const table: [number, number, number, number, number, number][] = [
    [1.2, 0.0909, 20.83, 0.83, 99.17, 0.036],
    [1.5, 0.2, 13.98, 4.0, 96.0, 0.177],
    [2, 0.3333, 9.54, 11.11, 88.89, 0.512],
    [3, 0.5, 6.02, 25.0, 75.0, 1.249],
    [5, 0.6667, 3.52, 44.44, 55.56, 2.553],
    [10, 0.8182, 1.74, 66.94, 33.06, 4.807],
  ];
  it.each(table)('VSWR %d: |Γ| %d, RL %d dB, reflected %d %%, transmitted %d %%, ML %d dB', (vswr, gamma, rl, reflected, transmitted, ml) => {
    const g = gammaMagnitudeFromVswr(vswr);
    expect(g).toBeCloseTo(gamma, 4);
    expect(returnLossDbFromGammaMagnitude(g)).toBeCloseTo(rl, 2);
    expect(returnLossDbFromVswr(vswr)).toBeCloseTo(rl, 2);
    expect(reflectedFractionFromGammaMagnitude(g) * 100).toBeCloseTo(reflected, 2);
    expect(transmittedFractionFromGammaMagnitude(g) * 100).toBeCloseTo(transmitted, 2);
    expect(mismatchLossDbFromGammaMagnitude(g)).toBeCloseTo(ml, 3);
    expect(vswrFromGammaMagnitude(g)).toBeCloseTo(vswr, 12);
  });

  it('refuses a VSWR below 1', () => {
    expect(() => gammaMagnitudeFromVswr(0.9)).toThrow(RangeError);
  });
});

describe(vswrFromReturnLossDb.name, () => {
  // The inverse direction: −10 dB is VSWR 1.925, not 2.
  it('RL 10 dB → |Γ| 0.3162, VSWR 1.925, ML 0.458 dB', () => {
    expect(gammaMagnitudeFromReturnLossDb(10)).toBeCloseTo(0.3162, 4);
    expect(vswrFromReturnLossDb(10)).toBeCloseTo(1.925, 3);
    expect(mismatchLossDbFromGammaMagnitude(gammaMagnitudeFromReturnLossDb(10))).toBeCloseTo(0.458, 3);
  });
  it('RL 6 dB → VSWR 3.01 and RL 20 dB → VSWR 1.222', () => {
    expect(vswrFromReturnLossDb(6)).toBeCloseTo(3.01, 2);
    expect(vswrFromReturnLossDb(20)).toBeCloseTo(1.222, 3);
  });
  it('a total reflection has infinite VSWR and 0 dB return loss', () => {
    expect(vswrFromGammaMagnitude(1)).toBe(Infinity);
    expect(returnLossDbFromGammaMagnitude(1)).toBeCloseTo(0, 12);
  });
});

describe(gammaFromImpedance.name, () => {
  // Pozar 4th ed. §2.3 (Z0 = 50 Ω).
  const table: [number, number, number, number, number, number, number][] = [
    // re, im, |Γ|, angle°, VSWR, RL dB, transmitted %
    [25, 0, 0.3333, 180, 2.0, 9.54, 88.89],
    [100, 0, 0.3333, 0, 2.0, 9.54, 88.89],
    [50, 50, 0.4472, 63.43, 2.618, 6.99, 80.0],
    [75, 0, 0.2, 0, 1.5, 13.98, 96.0],
  ];
  it.each(table)('Z = %d%+dj Ω: |Γ| %d ∠%d°, VSWR %d, RL %d dB, %d %% transmitted', (re, im, gamma, angle, vswr, rl, transmitted) => {
    const summary = summarizeReflection(gammaFromImpedance(complex(re, im), 50));
    expect(summary.gammaMagnitude).toBeCloseTo(gamma, 4);
    expect(Math.abs(summary.gammaAngleDeg)).toBeCloseTo(angle, 2);
    expect(summary.vswr).toBeCloseTo(vswr, 3);
    expect(summary.returnLossDb).toBeCloseTo(rl, 2);
    expect(summary.transmittedFraction * 100).toBeCloseTo(transmitted, 2);
  });

  it('50 + j50 Ω gives Γ = 0.2 + j0.4 exactly', () => {
    const gamma = gammaFromImpedance(complex(50, 50), 50);
    expect(gamma.re).toBeCloseTo(0.2, 14);
    expect(gamma.im).toBeCloseTo(0.4, 14);
  });

  it('Z_L = 40 + j70 Ω on 100 Ω: |Γ| 0.589 ∠104.04°, SWR 3.87, RL 4.60 dB (Pozar 4th ed. Example 2.2)', () => {
    const summary = summarizeReflection(gammaFromImpedance(complex(40, 70), 100));
    expect(summary.gammaMagnitude).toBeCloseTo(0.589, 3);
    expect(summary.gammaAngleDeg).toBeCloseTo(104.04, 2);
    expect(summary.vswr).toBeCloseTo(3.87, 2);
    expect(summary.returnLossDb).toBeCloseTo(4.6, 2);
  });
});

describe(impedanceFromGamma.name, () => {
  it('inverts gammaFromImpedance for any reference, including 75 Ω and a complex one (Pozar 4th ed. §2.3, §2.7)', () => {
    for (const reference of [50, 75, complex(50, 10)]) {
      const z = complex(33.3, -71.2);
      const back = impedanceFromGamma(gammaFromImpedance(z, reference), reference);
      expect(back.re).toBeCloseTo(z.re, 10);
      expect(back.im).toBeCloseTo(z.im, 10);
    }
  });
  it('Γ = −1/3 on 50 Ω is 25 Ω', () => {
    const z = impedanceFromGamma(complex(-1 / 3), 50);
    expect(z.re).toBeCloseTo(25, 12);
    expect(z.im).toBeCloseTo(0, 12);
    expect(magnitude(z)).toBeCloseTo(25, 12);
    expect(angleDeg(complex(-1, 0))).toBe(180);
  });
});
