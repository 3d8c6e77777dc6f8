import { gammaMagnitudeFromVswr } from './mismatch';
import { SHORT_DIPOLE_DIRECTIVITY_DBI, impliedDirectivityDbi, impliedDirectivityInBand, judgeDirectivity } from './implied-directivity';

describe('implied directivity', () => {
  it('puts a short dipole at 1.5 = 1.76 dBi (Balanis, Antenna Theory, 4th ed., §4.2)', () => {
    expect(SHORT_DIPOLE_DIRECTIVITY_DBI).toBeCloseTo(1.761, 3);
  });

  // rf-reference §3.4: G = η_rad × D (Balanis 4th ed. §2.14; IEEE Std 145-2013, from memory); check values from there.
  it('takes D = G / η on one basis: the book checks give back their directivities', () => {
    // η 50 % × λ/2 dipole (1.64, 2.15 dBi) → G 0.82 = −0.86 dBi.
    expect(impliedDirectivityDbi(-0.86, 'peak', 50, 'radiation', null)).toBeCloseTo(2.15, 2);
    // η 70 % × short dipole → G 1.05 = +0.21 dBi.
    expect(impliedDirectivityDbi(0.2119, 'peak', 70, 'radiation', null)).toBeCloseTo(1.76, 2);
    // η 25 % isotropic → −6.02 dBi.
    expect(impliedDirectivityDbi(-6.02, 'peak', 25, 'radiation', null)).toBeCloseTo(0, 2);
    // Realized gain with total efficiency is the same pair one basis over (G_r = η_tot D).
    expect(impliedDirectivityDbi(-0.86, 'realized', 50, 'total', null)).toBeCloseTo(2.15, 2);
  });

  it('reads the issue example as 10 dBi: a chip at 3 dBi peak and 20 % efficiency (20 % = −6.99 dB, rf-reference §3.3)', () => {
    const d = impliedDirectivityDbi(3, 'peak', 20, 'radiation', null)!;
    expect(d).toBeCloseTo(9.99, 2);
    expect(judgeDirectivity(d, 5)).toBe('above-form-factor');
  });

  it('converts the gain to the efficiency basis with |Γ| (VSWR 2 costs 0.512 dB, Pozar 4th ed. §2.3)', () => {
    // λ/2 dipole at 60 % radiation efficiency: G = −0.07 dBi, realized at VSWR 2 = −0.58 dBi; total efficiency 53.3 % (rf-reference §3.4).
    const gamma = gammaMagnitudeFromVswr(2);
    const realized = 2.15 + 10 * Math.log10(0.6) - 0.512;
    expect(impliedDirectivityDbi(realized, 'realized', 60, 'radiation', gamma)).toBeCloseTo(2.15, 2);
    expect(impliedDirectivityDbi(realized, 'realized', 53.33, 'total', gamma)).toBeCloseTo(2.15, 2);
    expect(impliedDirectivityDbi(2.15 + 10 * Math.log10(0.6), 'peak', 53.33, 'total', gamma)).toBeCloseTo(2.15, 2);
  });

  it('gives no figure when the bases differ and |Γ| is unknown, or the efficiency is zero', () => {
    expect(impliedDirectivityDbi(1, 'realized', 50, 'radiation', null)).toBeNull();
    expect(impliedDirectivityDbi(1, 'peak', 0, 'radiation', null)).toBeNull();
  });

  it('judges against the short dipole floor and the form-factor ceiling', () => {
    expect(judgeDirectivity(1.7, 5)).toBe('below-dipole');
    expect(judgeDirectivity(1.77, 5)).toBe('plausible');
    expect(judgeDirectivity(5, 5)).toBe('plausible');
    expect(judgeDirectivity(5.01, 5)).toBe('above-form-factor');
  });

  describe(impliedDirectivityInBand.name, () => {
    const f = [700e6, 800e6, 900e6, 1000e6];
    const gain = { frequenciesHz: f, values: [-1, 0, 1, 2] };
    const efficiency = { frequenciesHz: f, values: [50, 50, 50, 50] };

    it('finds the highest and lowest D over the band, point by point (D = G + 3.01 dB at 50 %)', () => {
      const d = impliedDirectivityInBand(gain, 'peak', efficiency, 'radiation', { fromHz: 750e6, toHz: 950e6 }, null);
      expect(d).toMatchObject({ status: 'ok', maxAtHz: 950e6, minAtHz: 750e6 });
      if (d.status !== 'ok') throw new Error('expected figures');
      expect(d.maxDbi).toBeCloseTo(1.5 + 3.0103, 4);
      expect(d.minDbi).toBeCloseTo(-0.5 + 3.0103, 4);
    });

    it('converts realized gain with the measured |Γ| at each frequency, and says so when it cannot', () => {
      const gamma = { frequenciesHz: f, values: f.map(() => gammaMagnitudeFromVswr(2)) };
      const d = impliedDirectivityInBand(gain, 'realized', efficiency, 'radiation', { fromHz: 800e6, toHz: 900e6 }, gamma);
      if (d.status !== 'ok') throw new Error('expected figures');
      expect(d.maxDbi).toBeCloseTo(1 + 0.5115 + 3.0103, 3);
      expect(impliedDirectivityInBand(gain, 'realized', efficiency, 'radiation', { fromHz: 800e6, toHz: 900e6 }, null)).toEqual({ status: 'bases-differ' });
    });

    it('has no data for a band outside either curve', () => {
      expect(impliedDirectivityInBand(gain, 'peak', efficiency, 'radiation', { fromHz: 600e6, toHz: 900e6 }, null)).toMatchObject({ status: 'no-data' });
    });
  });
});
