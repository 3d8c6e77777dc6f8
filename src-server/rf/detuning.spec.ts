import { complex } from './complex';
import { detuningMargin } from './detuning';
import { gammaFromImpedance } from './mismatch';
import { matchedRanges, reflectionCurveFromGamma } from './reflection';

/**
 * A series RLC antenna model matched at f0 (R = Z0 = 50 Ω): Z = R + jR·Q·(u − 1/u), u = f/f0, so
 * |Γ|² = X²/(4R² + X²) and VSWR ≤ 2 (|Γ| ≤ 1/3, Pozar 4th ed. §2.3) holds where |X| ≤ R/√2, that is where
 * Q·|u − 1/u| ≤ 1/√2. The band edges solve u² ∓ a·u − 1 = 0 with a = 1/(Q√2): u = (±a + √(a² + 4))/2.
 */
const F0 = 868e6;
const Q = 12;
const a = 1 / (Q * Math.SQRT2);
const LOWER_EDGE_HZ = F0 * ((-a + Math.sqrt(a * a + 4)) / 2);
const UPPER_EDGE_HZ = F0 * ((a + Math.sqrt(a * a + 4)) / 2);

function resonatorCurve(fromHz: number, toHz: number, points: number, f0 = F0) {
  const frequenciesHz = Float64Array.from({ length: points }, (_, i) => fromHz + ((toHz - fromHz) * i) / (points - 1));
  const re = new Float64Array(points);
  const im = new Float64Array(points);
  frequenciesHz.forEach((f, i) => {
    const gamma = gammaFromImpedance(complex(50, 50 * Q * (f / f0 - f0 / f)), 50);
    re[i] = gamma.re;
    im[i] = gamma.im;
  });
  return reflectionCurveFromGamma(frequenciesHz, re, im);
}

describe('detuning margin', () => {
  const curve = resonatorCurve(700e6, 1000e6, 30_001);
  const matched = matchedRanges(curve, { kind: 'vswr', maxVswr: 2 });
  const measured = { fromHz: 700e6, toHz: 1000e6 };

  it('finds the closed-form matched band of the resonator (sanity of the model)', () => {
    expect(matched).toHaveLength(1);
    expect(matched[0].fromHz / LOWER_EDGE_HZ).toBeCloseTo(1, 6);
    expect(matched[0].toHz / UPPER_EDGE_HZ).toBeCloseTo(1, 6);
  });

  it('gives the shifts that bring a band edge to a matched edge: (1 − f2/f_high) down and (f1/f_low − 1) up', () => {
    // EU868 SRD band 863–870 MHz (ERC/REC 70-03 Annex 1) inside the ~851–885 MHz matched band.
    const band = { fromHz: 863e6, toHz: 870e6 };
    const margin = detuningMargin(matched, band, measured)!;
    expect(margin.downPct).toBeCloseTo((1 - 870e6 / UPPER_EDGE_HZ) * 100, 3);
    expect(margin.upPct).toBeCloseTo((863e6 / LOWER_EDGE_HZ - 1) * 100, 3);
    expect(margin.downLimitedByData || margin.upLimitedByData).toBe(false);
    // A resonator tuned up by exactly that margin has its lower matched edge on the band's lower edge.
    const detuned = matchedRanges(resonatorCurve(700e6, 1000e6, 30_001, F0 * (1 + margin.upPct / 100)), { kind: 'vswr', maxVswr: 2 });
    expect(detuned[0].fromHz / 863e6).toBeCloseTo(1, 6);
  });

  it('is zero at the matched edge, and null for a band that already fails or straddles the edge', () => {
    const atEdge = detuningMargin(matched, { fromHz: LOWER_EDGE_HZ + 1, toHz: 870e6 }, measured)!;
    expect(atEdge.upPct).toBeCloseTo(0, 4);
    expect(detuningMargin(matched, { fromHz: 840e6, toHz: 870e6 }, measured)).toBeNull();
    expect(detuningMargin(matched, { fromHz: 902e6, toHz: 928e6 }, measured)).toBeNull();
  });

  it('says when the margin is cut by the end of the measured data', () => {
    const narrow = resonatorCurve(860e6, 876e6, 2001);
    const margin = detuningMargin(matchedRanges(narrow, { kind: 'vswr', maxVswr: 2 }), { fromHz: 863e6, toHz: 870e6 }, { fromHz: 860e6, toHz: 876e6 })!;
    expect(margin.downLimitedByData).toBe(true);
    expect(margin.upLimitedByData).toBe(true);
    expect(margin.downPct).toBeCloseTo((1 - 870 / 876) * 100, 6);
  });
});
