import { gammaMagnitudeFromVswr } from './mismatch';
import { gainOfBasis, realizedGainAtRadioPortDbi, systemEfficiency, totalEfficiencyOfBasis } from './figure-basis';

describe('figure basis', () => {
  // Pozar, Microwave Engineering 4th ed. §2.3: |Γ| = (VSWR − 1)/(VSWR + 1); transmitted 1 − |Γ|², mismatch loss −10 log10(1 − |Γ|²).
  const gammaAt3 = gammaMagnitudeFromVswr(3);

  it('counts the mismatch only for radiation data: 40 % at VSWR 3 → 30 % total, a 40 % total figure stays 40 %', () => {
    expect(totalEfficiencyOfBasis(0.4, 'radiation', gammaAt3)).toBeCloseTo(0.3, 12);
    expect(totalEfficiencyOfBasis(0.4, 'total', gammaAt3)).toBe(0.4);
    // rf-reference §3.4 (IEEE Std 145-2013, from memory): 60 % at VSWR 2 → 53.3 %; 70 % at VSWR 1.5 → 67.2 %.
    expect(totalEfficiencyOfBasis(0.6, 'radiation', gammaMagnitudeFromVswr(2))).toBeCloseTo(0.5333, 4);
    expect(totalEfficiencyOfBasis(0.7, 'radiation', gammaMagnitudeFromVswr(1.5))).toBeCloseTo(0.672, 4);
  });

  it('moves gain between peak and realized by the mismatch loss (1.249 dB at VSWR 3, 0.512 dB at VSWR 2)', () => {
    expect(gainOfBasis(2, 'peak', 'realized', gammaAt3)).toBeCloseTo(2 - 1.249, 3);
    expect(gainOfBasis(2, 'realized', 'peak', gammaAt3)).toBeCloseTo(2 + 1.249, 3);
    expect(gainOfBasis(2, 'peak', 'realized', gammaMagnitudeFromVswr(2))).toBeCloseTo(2 - 0.512, 3);
    expect(gainOfBasis(2, 'realized', 'realized', gammaAt3)).toBe(2);
  });

  // System efficiency = total efficiency × 10^(−L/10); realized gain at the port = realized gain − L (definitions, rf-reference §6).
  it('takes the feed loss off at the radio port: 1.5 dB on 50 % → 35.4 %, 3 dB halves it (50.1 %)', () => {
    expect(systemEfficiency(0.5, 1.5)).toBeCloseTo(0.35397, 5);
    expect(systemEfficiency(1, 3)).toBeCloseTo(0.501, 3);
    expect(systemEfficiency(0.5, 0)).toBe(0.5);
    expect(realizedGainAtRadioPortDbi(1, 1.5)).toBe(-0.5);
  });
});
