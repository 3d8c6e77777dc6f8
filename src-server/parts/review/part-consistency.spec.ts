import { gammaMagnitudeFromVswr } from '../../rf/mismatch';
import { reflectionCurveFromGamma } from '../../rf/reflection';
import type { SpecBandClaim } from '../spec-coverage';
import { type ConsistencyInput, checkPartConsistency } from './part-consistency';

const claim = (overrides: Partial<SpecBandClaim> = {}): SpecBandClaim => ({
  fromHz: 1710e6,
  toHz: 2690e6,
  maxVswr: 2,
  minReturnLossDb: null,
  efficiencyPct: null,
  efficiencyBasis: 'total',
  efficiencyStatistic: 'average',
  peakGainDbi: null,
  averageGainDbi: null,
  gainBasis: 'peak',
  ...overrides,
});

/** |Γ| rising linearly from VSWR 1.5 at 1710 MHz to VSWR 6.72 at 2690 MHz (real Γ; Γ = (VSWR − 1)/(VSWR + 1), Pozar 4th ed. §2.3). */
const s11 = () => {
  const f = Float64Array.from([1700e6, 1710e6, 2200e6, 2690e6, 2700e6]);
  const g = [1.5, 1.5, 3, 6.72, 6.72].map(gammaMagnitudeFromVswr);
  return reflectionCurveFromGamma(f, Float64Array.from(g), new Float64Array(f.length));
};

const input = (overrides: Partial<ConsistencyInput> = {}): ConsistencyInput => ({
  formFactor: 'chip',
  datasheetCount: 1,
  specBands: [claim()],
  s11: s11(),
  efficiency: null,
  peakGain: null,
  ...overrides,
});

describe(checkPartConsistency.name, () => {
  it('sets the claimed VSWR against the measured worst: claims ≤ 2 over 1710–2690 MHz, measured 6.72 at 2690 MHz', () => {
    const result = checkPartConsistency(input());
    expect(result.bands[0]).toMatchObject({ fromMhz: 1710, toMhz: 2690, claimedMaxVswr: 2, vswrAgrees: false, measuredWorstVswrAtMhz: 2690 });
    expect(result.bands[0].measuredWorstVswr).toBeCloseTo(6.72, 6);
    expect(result.disagreements).toBe(1);
  });

  it('reads a return-loss claim as its VSWR (RL 9.54 dB = VSWR 2, rf-reference §3.2) and agrees when the measurement holds it', () => {
    const result = checkPartConsistency(input({ specBands: [claim({ fromHz: 1710e6, toHz: 1800e6, maxVswr: null, minReturnLossDb: 9.54 })] }));
    expect(result.bands[0].claimedMaxVswr).toBeCloseTo(2, 2);
    expect(result.bands[0].vswrAgrees).toBe(true);
    expect(result.disagreements).toBe(0);
  });

  it('lists what is missing: datasheet, S11, efficiency and gain', () => {
    expect(checkPartConsistency(input({ datasheetCount: 0, s11: null })).missing).toEqual(['datasheet', 's11', 'efficiency', 'peak-gain']);
    expect(checkPartConsistency(input({ specBands: [] })).missing).toEqual(['spec-bands', 'efficiency', 'peak-gain']);
  });

  it('flags a chip claiming 3 dBi peak at 20 % radiation efficiency: 10 dBi implied, above its 5 dBi ceiling (issue example)', () => {
    const result = checkPartConsistency(
      input({ s11: null, specBands: [claim({ maxVswr: null, peakGainDbi: 3, efficiencyPct: 20, efficiencyBasis: 'radiation', gainBasis: 'peak' })] }),
    );
    expect(result.plausibleMaxDirectivityDbi).toBe(5);
    expect(result.bands[0].directivity).toMatchObject({ source: 'datasheet', verdict: 'above-form-factor' });
    expect(result.bands[0].directivity!.maxDbi).toBeCloseTo(9.99, 2);
    expect(result.disagreements).toBe(1);
  });

  it('flags a directivity below a short dipole (1.76 dBi, Balanis §4.2): −3 dBi at 80 % is 2 dB short', () => {
    const result = checkPartConsistency(
      input({ s11: null, specBands: [claim({ maxVswr: null, peakGainDbi: -3, efficiencyPct: 80, efficiencyBasis: 'radiation' })] }),
    );
    expect(result.bands[0].directivity).toMatchObject({ verdict: 'below-dipole' });
    expect(result.bands[0].directivity!.maxDbi).toBeCloseTo(-3 + 0.969, 3);
  });

  it('accepts a patch at 5 dBi and 70 % (D 6.55 dBi, under its 9 dBi ceiling)', () => {
    const result = checkPartConsistency(
      input({ formFactor: 'patch', s11: null, specBands: [claim({ maxVswr: null, peakGainDbi: 5, efficiencyPct: 70, efficiencyBasis: 'radiation' })] }),
    );
    expect(result.bands[0].directivity).toMatchObject({ verdict: 'plausible' });
    expect(result.disagreements).toBe(0);
  });

  it('brings total efficiency to the peak gain basis with the measured worst |Γ| in the band', () => {
    // A λ/2 dipole (2.15 dBi) at 60 % radiation efficiency: G = −0.07 dBi; at VSWR 2 its total efficiency is 53.3 % (rf-reference §3.4).
    const f = Float64Array.from([800e6, 900e6]);
    const flat = reflectionCurveFromGamma(f, Float64Array.from([1 / 3, 1 / 3]), new Float64Array(2));
    const result = checkPartConsistency(
      input({
        formFactor: 'external-whip',
        s11: flat,
        specBands: [
          claim({ fromHz: 820e6, toHz: 880e6, maxVswr: 2, peakGainDbi: 2.15 + 10 * Math.log10(0.6), efficiencyPct: 53.33, efficiencyBasis: 'total' }),
        ],
      }),
    );
    expect(result.bands[0].directivity!.maxDbi).toBeCloseTo(2.15, 2);
  });

  it('compares measured curves point by point, and efficiency only on the same basis', () => {
    const f = [1700e6, 2700e6];
    const result = checkPartConsistency(
      input({
        specBands: [
          claim({ maxVswr: null, efficiencyPct: 60, efficiencyBasis: 'radiation', efficiencyStatistic: 'average', peakGainDbi: 2, gainBasis: 'peak' }),
        ],
        efficiency: { curve: { frequenciesHz: f, values: [40, 40] }, basis: 'radiation' },
        peakGain: { curve: { frequenciesHz: f, values: [1, 1] }, basis: 'peak' },
      }),
    );
    expect(result.bands[0]).toMatchObject({ efficiencyAgrees: false, peakGainAgrees: false, measuredEfficiencyPct: 40, measuredPeakGainDbi: 1 });
    // 1 dBi at 40 % → D = 1 + 3.98 = 4.98 dBi (40 % = −3.98 dB, rf-reference §3.3).
    expect(result.bands[0].directivity).toMatchObject({ source: 'measured', verdict: 'plausible' });
    expect(result.bands[0].directivity!.maxDbi).toBeCloseTo(4.98, 2);
    const otherBasis = checkPartConsistency(
      input({
        specBands: [claim({ efficiencyPct: 60, efficiencyBasis: 'total' })],
        efficiency: { curve: { frequenciesHz: f, values: [40, 40] }, basis: 'radiation' },
      }),
    );
    expect(otherBasis.bands[0].efficiencyAgrees).toBeNull();
  });
});
