import fc from 'fast-check';
import { complex, magnitude } from './complex';
import { designLSectionMatch, inputImpedance, type LSectionNetwork, lSectionSolutions, returnLossSweep, snapNetwork } from './matching';
import { gammaFromImpedance } from './mismatch';

function describeNetwork(network: LSectionNetwork): string[] {
  return network.elements.map((e) => {
    const c = e.component;
    const value = c.kind === 'inductor' ? `${c.inductanceNh.toFixed(1)} nH` : c.kind === 'capacitor' ? `${c.capacitancePf.toFixed(2)} pF` : 'none';
    return `${e.position} ${e.connection} ${c.kind} ${value}`;
  });
}

describe(lSectionSolutions.name, () => {
  // Pozar, Microwave Engineering 4th ed., Example 5.1: Z_L = 200 − j100 Ω to a 100 Ω line at 500 MHz.
  // The book's values (from memory): solution 1 C = 0.92 pF shunt, L = 38.8 nH series; solution 2 L = 46.1 nH shunt,
  // C = 2.61 pF series. Our own derivation with §5.1's formulas gives B = 2.899 mS / −6.899 mS, X = ±122.5 Ω.
  const solutions = lSectionSolutions(complex(200, -100), 100, 500e6);

  it('finds exactly the two shunt-at-load solutions (R_L > Z0, Pozar Fig. 5.2a)', () => {
    expect(solutions).toHaveLength(2);
    expect(solutions.map((s) => s.topology)).toEqual(['shunt-at-load', 'shunt-at-load']);
  });

  it('solution 1: shunt C 0.92 pF at the load, series L 38.8 nH at the source', () => {
    const [shunt, series] = solutions[0].elements;
    expect(shunt).toMatchObject({ connection: 'shunt', position: 'load-side', component: { kind: 'capacitor' } });
    expect(series).toMatchObject({ connection: 'series', position: 'source-side', component: { kind: 'inductor' } });
    expect(shunt.component.kind === 'capacitor' && shunt.component.capacitancePf).toBeCloseTo(0.92, 2);
    expect(series.component.kind === 'inductor' && series.component.inductanceNh).toBeCloseTo(38.8, 0);
    // Unrounded, this example gives 0.923 pF and 38.98 nH.
    expect(shunt.component.kind === 'capacitor' && shunt.component.capacitancePf).toBeCloseTo(0.923, 3);
    expect(series.component.kind === 'inductor' && series.component.inductanceNh).toBeCloseTo(38.98, 1);
  });

  it('solution 2: shunt L 46.1 nH at the load, series C 2.61 pF at the source (book rounding ±0.01 pF)', () => {
    const [shunt, series] = solutions[1].elements;
    expect(shunt.component.kind === 'inductor' && shunt.component.inductanceNh).toBeCloseTo(46.1, 1);
    expect(series.component.kind).toBe('capacitor');
    const capacitancePf = series.component.kind === 'capacitor' ? series.component.capacitancePf : NaN;
    expect(Math.abs(capacitancePf - 2.61)).toBeLessThan(0.015);
  });

  it('gives Zin = Z0 at the design frequency for every solution of random loads (Pozar 4th ed. §5.1 identity)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 2000, noNaN: true }),
        fc.double({ min: -2000, max: 2000, noNaN: true }),
        fc.constantFrom(50, 75, 100),
        fc.double({ min: 1e6, max: 1e10, noNaN: true }),
        (resistance, reactance, z0, frequencyHz) => {
          const load = complex(resistance, reactance);
          const found = lSectionSolutions(load, z0, frequencyHz);
          expect(found.length).toBeGreaterThanOrEqual(2);
          for (const network of found) {
            const zin = inputImpedance(network, load, frequencyHz);
            expect(magnitude(gammaFromImpedance(zin, z0))).toBeLessThan(1e-7);
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it('offers both topologies when R_L < Z0 and Re Y_L < 1/Z0, preferring series-at-load (Pozar §5.1)', () => {
    const found = lSectionSolutions(complex(20, 80), 50, 1e9);
    expect(found.map((s) => s.topology)).toEqual(['series-at-load', 'series-at-load', 'shunt-at-load', 'shunt-at-load']);
  });

  it('returns a single trivial network for a matched load', () => {
    const found = lSectionSolutions(complex(50, 0), 50, 1e9);
    expect(found.some((s) => s.elements.every((e) => e.component.kind === 'none'))).toBe(true);
  });

  it('refuses a load without resistance', () => {
    expect(() => lSectionSolutions(complex(0, 50), 50, 1e9)).toThrow(RangeError);
  });
});

describe(snapNetwork.name, () => {
  it('snaps Example 5.1 solution 1 to E24 0.91 pF and 39 nH (IEC 60063)', () => {
    const snapped = snapNetwork(lSectionSolutions(complex(200, -100), 100, 500e6)[0], 'E24');
    expect(describeNetwork(snapped)).toEqual(['load-side shunt capacitor 0.91 pF', 'source-side series inductor 39.0 nH']);
    expect(describeNetwork(snapNetwork(lSectionSolutions(complex(200, -100), 100, 500e6)[0], 'E12'))[0]).toBe('load-side shunt capacitor 1.00 pF');
  });
});

describe(returnLossSweep.name, () => {
  const load = complex(200, -100);
  const exact = lSectionSolutions(load, 100, 500e6)[0];

  it('is deepest at the design frequency and falls off either side for a constant load', () => {
    const sweep = returnLossSweep(exact, load, 100, [400e6, 500e6, 600e6]);
    if (sweep.status !== 'ok') throw new Error(sweep.reason);
    const [low, centre, high] = sweep.points.map((p) => p.returnLossDb);
    expect(centre).toBeGreaterThan(60);
    expect(low).toBeLessThan(centre);
    expect(high).toBeLessThan(centre);
  });

  it('uses a measured Z(f) when given, and reports no data outside it', () => {
    // A series RC load (Example 5.1's 200 Ω with −100 Ω at 500 MHz): X = −1/(ωC), so C = 3.183 pF.
    const capacitanceF = 1 / (2 * Math.PI * 500e6 * 100);
    const frequenciesHz = [300e6, 400e6, 500e6, 600e6, 700e6];
    const curve = {
      frequenciesHz,
      resistanceOhms: frequenciesHz.map(() => 200),
      reactanceOhms: frequenciesHz.map((f) => -1 / (2 * Math.PI * f * capacitanceF)),
    };
    const measured = returnLossSweep(exact, curve, 100, [400e6, 500e6, 600e6]);
    const constant = returnLossSweep(exact, load, 100, [400e6, 500e6, 600e6]);
    if (measured.status !== 'ok' || constant.status !== 'ok') throw new Error('expected data');
    expect(measured.points[1].returnLossDb).toBeGreaterThan(60);
    expect(measured.points[0].returnLossDb).not.toBeCloseTo(constant.points[0].returnLossDb, 3);
    expect(returnLossSweep(exact, curve, 100, [200e6, 500e6])).toMatchObject({ status: 'no-data' });
  });
});

describe(designLSectionMatch.name, () => {
  it('returns exact and snapped solutions with sweeps; the snapped match is still good at the design frequency', () => {
    const result = designLSectionMatch({
      frequencyHz: 500e6,
      loadOhms: complex(200, -100),
      z0Ohms: 100,
      series: 'E24',
      sweep: { fromHz: 450e6, toHz: 550e6, points: 11 },
    });
    expect(result).toHaveLength(2);
    for (const solution of result) {
      expect(solution.snappedReturnLossDb).toBeGreaterThan(15);
      expect(solution.snappedSweep).toMatchObject({ status: 'ok' });
      expect(solution.exactSweep?.status === 'ok' && solution.exactSweep.points).toHaveLength(11);
    }
  });
});
