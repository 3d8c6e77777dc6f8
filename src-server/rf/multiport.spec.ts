import { execFileSync } from 'node:child_process';
import { complex } from './complex';
import { envelopeCorrelation, envelopeCorrelationCurve, isolationCurve, isolationDbFromTransmission, pairInBand } from './multiport';
import { readTouchstone } from './touchstone';
import { writeTouchstone } from './touchstone-writer';

describe('isolation and envelope correlation between two ports', () => {
  it('isolation is −20·log10|Sij|: |S21| = 0.1 is 20 dB, 0.01 is 40 dB (Pozar, Microwave Engineering 4th ed. §4.3)', () => {
    expect(isolationDbFromTransmission(complex(0.1, 0))).toBeCloseTo(20, 12);
    expect(isolationDbFromTransmission(complex(0, -0.01))).toBeCloseTo(40, 12);
  });

  it('two uncoupled, matched antennas are uncorrelated: ρe = 0 (constructed case)', () => {
    expect(envelopeCorrelation(complex(0), complex(0), complex(0), complex(0))).toBe(0);
    // Uncoupled but mismatched: still no cross term, so still 0.
    expect(envelopeCorrelation(complex(0.3, 0.1), complex(0), complex(0), complex(-0.2, 0.4))).toBe(0);
  });

  it('a symmetric coupled pair with in-phase reflections is fully correlated, opposite reflections cancel (constructed from the formula)', () => {
    // S11 = S22 = S12 = S21 = 0.5: |0.25 + 0.25|² / ((1 − 0.25 − 0.25)²) = 0.25 / 0.25 = 1.
    expect(envelopeCorrelation(complex(0.5), complex(0.5), complex(0.5), complex(0.5))).toBeCloseTo(1, 14);
    // S22 = −S11: the two cross terms cancel, ρe = 0.
    expect(envelopeCorrelation(complex(0.5), complex(0.5), complex(0.5), complex(-0.5))).toBeCloseTo(0, 14);
    // All power reflected or passed on: nothing radiates, ρe is undefined.
    expect(envelopeCorrelation(complex(0.8), complex(0.6), complex(0.6), complex(0.8))).toBeNull();
  });

  it('matches numpy computing Blanch, Romeu and Corbella (Electronics Letters 39(9), 2003) independently on random passive pairs', () => {
    // Debian's python3 with numpy: the formula written again with numpy's complex arithmetic.
    const script = `
import json, numpy as np
rng = np.random.default_rng(7)
cases = []
for _ in range(200):
    s = (rng.normal(size=(2, 2)) + 1j * rng.normal(size=(2, 2))) * 0.25
    num = abs(np.conj(s[0, 0]) * s[0, 1] + np.conj(s[1, 0]) * s[1, 1]) ** 2
    den = (1 - abs(s[0, 0]) ** 2 - abs(s[1, 0]) ** 2) * (1 - abs(s[1, 1]) ** 2 - abs(s[0, 1]) ** 2)
    if (1 - abs(s[0, 0]) ** 2 - abs(s[1, 0]) ** 2) <= 0 or (1 - abs(s[1, 1]) ** 2 - abs(s[0, 1]) ** 2) <= 0:
        continue
    cases.append({'s': [[v.real, v.imag] for v in s.reshape(-1)], 'ecc': num / den})
print(json.dumps(cases))
`;
    const cases = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { encoding: 'utf8' })) as { s: [number, number][]; ecc: number }[];
    expect(cases.length).toBeGreaterThan(100);
    for (const { s, ecc } of cases) {
      const [s11, s12, s21, s22] = s.map(([re, im]) => complex(re, im));
      const ours = envelopeCorrelation(s11, s12, s21, s22)!;
      expect(Math.abs(ours - ecc)).toBeLessThanOrEqual(1e-12 * Math.max(ecc, 1e-12) + 1e-15);
    }
  });

  it('gives per-point curves and the worst case over a band from a 3-port file, refusing a port the file lacks', () => {
    const frequenciesHz = Float64Array.from([800e6, 850e6, 900e6, 950e6]);
    // Port 1 ↔ 3 coupling |S31| falls 0.2 → 0.05 over the sweep; other pairs are uncoupled and matched.
    const coupling = [0.2, 0.1, 0.0707, 0.05];
    const data = Array.from({ length: 9 }, (_, e) => {
      const row = Math.floor(e / 3);
      const column = e % 3;
      const pair = (row === 0 && column === 2) || (row === 2 && column === 0);
      return { re: Float64Array.from(coupling, (c) => (pair ? c : 0)), im: new Float64Array(4) };
    });
    const network = readTouchstone(writeTouchstone({ version: 1, ports: 3, frequenciesHz, data }), { expectedPorts: 3 });
    const isolation = isolationCurve(network, 1, 3);
    expect(isolation[0]).toBeCloseTo(13.98, 2); // −20·log10(0.2)
    expect(isolation[3]).toBeCloseTo(26.02, 2); // −20·log10(0.05)
    expect([...envelopeCorrelationCurve(network, 1, 2)]).toEqual([0, 0, 0, 0]);
    const inBand = pairInBand(network, 1, 3, { fromHz: 820e6, toHz: 900e6 });
    if (inBand.isolation.status !== 'ok') throw new Error('expected isolation in band');
    // Worst (least) isolation is at the lower band edge, 820 MHz: interpolated in dB between the 800 and 850 MHz samples.
    expect(inBand.isolation.min).toBeCloseTo(-20 * Math.log10(0.2) + (20 * Math.log10(0.2) - 20 * Math.log10(0.1)) * 0.4, 6);
    expect(inBand.correlation.status).toBe('ok');
    expect(() => isolationCurve(network, 1, 4)).toThrow(/does not exist/);
    expect(() => isolationCurve(network, 2, 2)).toThrow(RangeError);
  });
});
