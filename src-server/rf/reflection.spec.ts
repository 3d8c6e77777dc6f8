import {
  bandMatch,
  bestMatch,
  matchAt,
  matchedRanges,
  reflectionCurveFromGamma,
  reflectionCurveFromNetwork,
  RETURN_LOSS_10_DB_CRITERION,
  worstMatchInBand,
} from './reflection';
import { readTouchstone } from './touchstone';

const MHZ = 1e6;
// |Γ| rising linearly from 0 at 800 MHz to 0.5 at 1000 MHz (invented).
const ramp = reflectionCurveFromGamma(new Float64Array([800 * MHZ, 1000 * MHZ]), new Float64Array([0, 0.5]), new Float64Array([0, 0]));

describe(matchedRanges.name, () => {
  it('uses VSWR 2 (|Γ| 1/3) by default and RL 10 dB (|Γ| 0.3162) when chosen; they differ', () => {
    // Interpolation is linear in |Γ|, so the edge lies where |Γ| reaches the limit: 800 + 400 × |Γ| MHz.
    const [vswr2] = matchedRanges(ramp);
    const [rl10] = matchedRanges(ramp, RETURN_LOSS_10_DB_CRITERION);
    expect(vswr2.toHz).toBeCloseTo(800 * MHZ + (400 * MHZ) / 3, 3);
    expect(rl10.toHz).toBeCloseTo(800 * MHZ + 400 * MHZ * 10 ** -0.5, 3);
    expect(vswr2.toHz - rl10.toHz).toBeGreaterThan(6 * MHZ);
  });
});

describe(matchAt.name, () => {
  it('interpolates |Γ| and derives VSWR from it (Pozar 4th ed. §2.3)', () => {
    expect(matchAt(ramp, 900 * MHZ)?.gammaMagnitude).toBeCloseTo(0.25, 12);
    expect(matchAt(ramp, 900 * MHZ)?.vswr).toBeCloseTo(1.25 / 0.75, 12);
    expect(matchAt(ramp, 1100 * MHZ)).toBeUndefined();
  });
});

describe(bandMatch.name, () => {
  const exampleA = reflectionCurveFromNetwork(readTouchstone('# MHz S RI R 50\n820 0.5 0\n868 0.2 0\n915 0 -0.3333\n'));

  it('covers part of a band and reports the gap and the worst VSWR', () => {
    const result = bandMatch(exampleA, { fromHz: 820 * MHZ, toHz: 915 * MHZ });
    if (result.status !== 'ok') throw new Error(result.reason);
    expect(result.worst.vswr).toBeCloseTo(3, 9); // 820 MHz: |Γ| 0.5 → VSWR 3
    expect(result.uncoveredRanges).toHaveLength(1);
    expect(result.coveredRanges[0].toHz).toBe(915 * MHZ); // 915 MHz: |Γ| 0.3333 ≤ 1/3, VSWR 2.0
    expect(result.coveredFraction).toBeGreaterThan(0.5);
    expect(result.coveredFraction).toBeLessThan(1);
  });

  it('is "no data" for a band outside the measured range, never a pass', () => {
    expect(bandMatch(exampleA, { fromHz: 700 * MHZ, toHz: 900 * MHZ })).toMatchObject({ status: 'no-data' });
    expect(worstMatchInBand(exampleA, { fromHz: 900 * MHZ, toHz: 960 * MHZ })).toMatchObject({ status: 'no-data' });
  });

  it('handles a single-point file: its frequency has data, a band around it has none', () => {
    const single = reflectionCurveFromNetwork(readTouchstone('# MHz S RI\n868 0.2 0\n'));
    expect(bandMatch(single, { fromHz: 868 * MHZ, toHz: 868 * MHZ })).toMatchObject({ status: 'ok', coveredFraction: 1 });
    expect(bandMatch(single, { fromHz: 863 * MHZ, toHz: 870 * MHZ }).status).toBe('no-data');
    expect(bestMatch(single).vswr).toBeCloseTo(1.5, 12);
  });

  it('reads port 2 of a 2-port file', () => {
    const network = readTouchstone('# GHz S MA R 50\n2.40 0.333 -30 0.90 -60 0.05 10 0.20 45\n');
    expect(reflectionCurveFromNetwork(network, 2).gammaMagnitude[0]).toBeCloseTo(0.2, 12);
  });
});
