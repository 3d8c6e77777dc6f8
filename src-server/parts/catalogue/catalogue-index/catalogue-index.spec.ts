import fc from 'fast-check';
import { gammaMagnitudeFromReturnLossDb, gammaMagnitudeFromVswr } from '../../../rf/mismatch';
import type { EfficiencyBasis } from '../../../rf/figure-basis';
import type { SpecBandClaim } from '../../spec-coverage';
import { computeFacts } from '../../../compatibility/engine/compute-facts';
import { constructedRequirement, rangeMhz } from '../../../compatibility/engine/fixtures';
import { reflectionCurveFromGamma } from '../../../rf/reflection';
import {
  CatalogueIndex,
  type CoverageQuery,
  type IndexedPart,
  binsInside,
  coverageScreen,
  extremeInRange,
  meetsCoverage,
  screenLevels,
  screenRejects,
} from './catalogue-index';

const MHZ = 1e6;

function part(id: number, overrides: Partial<IndexedPart> = {}): IndexedPart {
  return {
    id,
    manufacturer: 'Unit Maker',
    mpn: `U-${id}`,
    title: 'unit part',
    formFactor: 'chip',
    connector: 'solder-pad',
    polarization: 'linear',
    lifecycle: 'active',
    reviewState: 'approved',
    searchText: `unit maker u-${id}`,
    lowestPrices: new Map(),
    measuredKinds: [],
    updatedAtMs: id,
    gamma: null,
    efficiency: null,
    efficiencyBasis: 'total',
    specBands: [],
    ...overrides,
  };
}

const curve = (points: [number, number][]) => ({ frequenciesHz: points.map(([f]) => f * MHZ), values: points.map(([, v]) => v) });
const band = (
  fromMhz: number,
  toMhz: number,
  maxVswr: number | null,
  efficiencyPct: number | null = null,
  minReturnLossDb: number | null = null,
  efficiencyBasis: EfficiencyBasis = 'total',
): SpecBandClaim => ({
  fromHz: fromMhz * MHZ,
  toHz: toMhz * MHZ,
  maxVswr,
  minReturnLossDb,
  efficiencyPct,
  efficiencyBasis,
  efficiencyStatistic: 'minimum',
  peakGainDbi: null,
  averageGainDbi: null,
  gainBasis: 'peak',
});

describe(extremeInRange.name, () => {
  it('takes interpolated edges and interior samples, and says no data outside the sweep', () => {
    const c = curve([
      [780, 0.5],
      [820, 0.2],
      [900, 0.2],
      [1000, 0.5],
    ]);
    expect(extremeInRange(c, { fromHz: 800 * MHZ, toHz: 900 * MHZ }, 'max')).toBeCloseTo(0.35, 12);
    expect(extremeInRange(c, { fromHz: 820 * MHZ, toHz: 900 * MHZ }, 'max')).toBeCloseTo(0.2, 12);
    expect(extremeInRange(c, { fromHz: 800 * MHZ, toHz: 1000 * MHZ }, 'min')).toBeCloseTo(0.2, 12);
    expect(extremeInRange(c, { fromHz: 700 * MHZ, toHz: 900 * MHZ }, 'max')).toBeUndefined();
  });
});

describe(meetsCoverage.name, () => {
  // |Γ| = 1/3 is VSWR 2 exactly (Pozar 4th ed. §2.3).
  const atLimit = part(1, {
    gamma: curve([
      [700, 0.6],
      [800, 0.2],
      [850, 1 / 3],
      [900, 0.2],
      [1000, 0.6],
    ]),
  });
  const range = { fromHz: 800 * MHZ, toHz: 900 * MHZ };

  it('passes at the limit, fails just below it, and ANDs every range', () => {
    expect(meetsCoverage(atLimit, { ranges: [range], vswrMax: 2 })).toBe(true);
    expect(meetsCoverage(atLimit, { ranges: [range], vswrMax: 1.999 })).toBe(false);
    expect(meetsCoverage(atLimit, { ranges: [range, { fromHz: 950 * MHZ, toHz: 1000 * MHZ }], vswrMax: 2 })).toBe(false);
  });

  it('falls back to spec bands where the curve does not reach, with return loss read as VSWR (RL 10 dB = VSWR 1.925, Pozar 4th ed. §2.3)', () => {
    const mixed = part(2, {
      gamma: curve([
        [800, 0.1],
        [900, 0.1],
      ]),
      specBands: [band(1700, 1900, 2), band(600, 800, 3)],
    });
    expect(meetsCoverage(mixed, { ranges: [range, { fromHz: 1710 * MHZ, toHz: 1880 * MHZ }], vswrMax: 2 })).toBe(true);
    expect(meetsCoverage(mixed, { ranges: [{ fromHz: 650 * MHZ, toHz: 750 * MHZ }], vswrMax: 2 })).toBe(false);
    const rl = part(3, { specBands: [band(791, 862, null, null, 10)] });
    expect(meetsCoverage(rl, { ranges: [{ fromHz: 791 * MHZ, toHz: 862 * MHZ }], vswrMax: 1.93 })).toBe(true);
    expect(meetsCoverage(rl, { ranges: [{ fromHz: 791 * MHZ, toHz: 862 * MHZ }], vswrMax: 1.92 })).toBe(false);
  });

  it('applies the efficiency floor to the minimum over the range, curve first, spec second', () => {
    const p = part(4, {
      gamma: curve([
        [700, 0.1],
        [1000, 0.1],
      ]),
      efficiency: curve([
        [700, 50],
        [850, 40],
        [1000, 50],
      ]),
    });
    expect(meetsCoverage(p, { ranges: [range], vswrMax: 2, minEfficiencyPct: 40 })).toBe(true);
    expect(meetsCoverage(p, { ranges: [range], vswrMax: 2, minEfficiencyPct: 40.01 })).toBe(false);
    const spec = part(5, { specBands: [band(791, 862, 2, 45), band(862, 960, 2, 50)] });
    expect(meetsCoverage(spec, { ranges: [{ fromHz: 800 * MHZ, toHz: 900 * MHZ }], vswrMax: 2, minEfficiencyPct: 45 })).toBe(true);
    expect(meetsCoverage(spec, { ranges: [{ fromHz: 800 * MHZ, toHz: 900 * MHZ }], vswrMax: 2, minEfficiencyPct: 46 })).toBe(false);
  });
});

describe(CatalogueIndex.name, () => {
  const base = { currency: 'USD', sort: 'mpn' as const, order: 'asc' as const, offset: 0, limit: 2 };

  it('pages and sorts without reordering the data, and sees an upsert at once', () => {
    const index = new CatalogueIndex();
    index.upsert([part(3), part(1), part(2, { reviewState: 'draft' })]);
    expect(index.search(base)).toEqual({ items: [expect.objectContaining({ id: 1 }), expect.objectContaining({ id: 2 })], total: 3 });
    expect(index.search({ ...base, order: 'desc', offset: 1 }).items.map((p) => p.id)).toEqual([2, 1]);
    expect(index.search({ ...base, status: ['approved'] }).total).toBe(2);
    // A cached result must not survive a change.
    index.upsert([part(2, { reviewState: 'approved' })]);
    expect(index.search({ ...base, status: ['approved'] }).total).toBe(3);
  });

  it('puts parts without a price in the asked currency last in both orders', () => {
    const index = new CatalogueIndex();
    index.upsert([part(1, { lowestPrices: new Map([['USD', 0.5]]) }), part(2), part(3, { lowestPrices: new Map([['USD', 0.2]]) })]);
    expect(index.search({ ...base, sort: 'price', limit: 0 }).items.map((p) => p.id)).toEqual([3, 1, 2]);
    expect(index.search({ ...base, sort: 'price', order: 'desc', limit: 0 }).items.map((p) => p.id)).toEqual([1, 3, 2]);
  });
});

describe(screenRejects.name, () => {
  // Values and edges are drawn so they often land exactly on a screen level or on a sample frequency.
  const levelValues = [...[1.5, 2, 2.5, 3, 4, 6].map(gammaMagnitudeFromVswr), gammaMagnitudeFromReturnLossDb(10)];
  const gammaValue = fc.oneof(fc.constantFrom(...levelValues), fc.double({ min: 0, max: 1, noNaN: true }));
  const efficiencyValue = fc.oneof(fc.constantFrom(10, 20, 30, 40, 50, 60, 70, 80, 90), fc.double({ min: 0, max: 100, noNaN: true }));
  const sampled = (value: fc.Arbitrary<number>) =>
    fc.uniqueArray(fc.integer({ min: 600, max: 1000 }), { minLength: 1, maxLength: 30 }).chain((mhz) => {
      const f = [...mhz].sort((a, b) => a - b);
      return fc.array(value, { minLength: f.length, maxLength: f.length }).map((values) => ({ frequenciesHz: f.map((x) => x * MHZ), values }));
    });
  const specBand = fc
    .tuple(
      fc.integer({ min: 550, max: 1050 }),
      fc.integer({ min: 0, max: 200 }),
      fc.option(fc.constantFrom(1.5, 2, 3), { nil: null }),
      fc.option(fc.constantFrom(30, 40, 50, 60), { nil: null }),
      fc.constantFrom<EfficiencyBasis>('radiation', 'total'),
    )
    .map(([from, width, vswr, efficiency, basis]) => band(from, from + width, vswr, efficiency, null, basis));
  const edge = fc.oneof(fc.integer({ min: 550, max: 1050 }), fc.double({ min: 550, max: 1050, noNaN: true }));
  const range = fc
    .tuple(edge, edge)
    .filter(([a, b]) => a !== b)
    .map(([a, b]) => ({ fromHz: Math.min(a, b) * MHZ, toHz: Math.max(a, b) * MHZ }));
  const query: fc.Arbitrary<CoverageQuery> = fc.record({
    ranges: fc.array(range, { minLength: 1, maxLength: 3 }),
    vswrMax: fc.oneof(fc.constantFrom(1.5, 1.925, 2, 2.5, 3, 4, 6), fc.double({ min: 1, max: 8, noNaN: true })),
    minEfficiencyPct: fc.option(fc.oneof(fc.constantFrom(10, 20, 40, 90), fc.double({ min: 0, max: 100, noNaN: true })), { nil: undefined }),
  });

  it('rejects only parts the exact check fails, so the search equals the exact filter (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.option(sampled(gammaValue), { nil: null }),
        fc.option(sampled(efficiencyValue), { nil: null }),
        fc.constantFrom<EfficiencyBasis>('radiation', 'total'),
        fc.array(specBand, { maxLength: 3 }),
        query,
        (gamma, efficiency, efficiencyBasis, specBands, q) => {
          const p = part(1, { gamma, efficiency, efficiencyBasis, specBands: [...specBands].sort((a, b) => a.fromHz - b.fromHz) });
          const exact = meetsCoverage(p, q);
          if (screenRejects(coverageScreen(p), screenLevels(q), q)) expect(exact).toBe(false);
          const index = new CatalogueIndex();
          index.upsert([p]);
          expect(index.search({ currency: 'USD', sort: 'mpn', order: 'asc', offset: 0, limit: 0, coverage: q }).total).toBe(exact ? 1 : 0);
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('uses only the 10 MHz bins wholly inside a range, so a bad sample just outside it turns nothing away', () => {
    // Bins are [k·10, (k+1)·10) MHz; 32 bins to a word.
    expect(Array.from(binsInside({ fromHz: 795 * MHZ, toHz: 830 * MHZ }))).toEqual([2, (1 << 16) | (1 << 17) | (1 << 18)]);
    expect(Array.from(binsInside({ fromHz: 800 * MHZ, toHz: 810 * MHZ }))).toEqual([2, 1 << 16]);
    expect(Array.from(binsInside({ fromHz: 801 * MHZ, toHz: 809 * MHZ }))).toEqual([]);
    // |Γ| 0.9 at 792 MHz and 901 MHz, 0.1 from 795 to 900 MHz: B-range 795-900 passes at VSWR 2.
    const p = part(1, {
      gamma: curve([
        [700, 0.9],
        [792, 0.9],
        [795, 0.1],
        [900, 0.1],
        [901, 0.9],
        [1000, 0.9],
      ]),
    });
    const q: CoverageQuery = { ranges: [{ fromHz: 795 * MHZ, toHz: 900 * MHZ }], vswrMax: 2 };
    expect(screenRejects(coverageScreen(p), screenLevels(q), q)).toBe(false);
    expect(meetsCoverage(p, q)).toBe(true);
    const wider: CoverageQuery = { ranges: [{ fromHz: 780 * MHZ, toHz: 900 * MHZ }], vswrMax: 2 };
    expect(screenRejects(coverageScreen(p), screenLevels(wider), wider)).toBe(true);
  });

  it('turns a part away on a sample over the limit, and leaves one on the limit to the exact check', () => {
    // |Γ| = 1/3 is VSWR 2 exactly (Pozar 4th ed. §2.3).
    const p = part(1, {
      gamma: curve([
        [700, 0.6],
        [800, 0.2],
        [850, 1 / 3],
        [900, 0.2],
        [1000, 0.6],
      ]),
    });
    const at = (vswrMax: number): CoverageQuery => ({ ranges: [{ fromHz: 800 * MHZ, toHz: 900 * MHZ }], vswrMax });
    expect(screenRejects(coverageScreen(p), screenLevels(at(2)), at(2))).toBe(false);
    expect(screenRejects(coverageScreen(p), screenLevels(at(1.5)), at(1.5))).toBe(true);
    expect(meetsCoverage(p, at(2))).toBe(true);
  });
});

describe('one definition of "covers" for search and matrix', () => {
  // Pozar, Microwave Engineering 4th ed. §2.3: |Γ| = (VSWR − 1)/(VSWR + 1) = 0.5 at VSWR 3, transmitted 1 − |Γ|² = 75 %.
  const vswr3 = curve([
    [700, 0.5],
    [1000, 0.5],
  ]);
  const b8 = { ranges: [rangeMhz(880, 915), rangeMhz(925, 960)], vswrMax: 3 };

  it('filters on total efficiency: 40 % radiation efficiency at VSWR 3 is 30 % total, 40 % stated as total stays 40 %', () => {
    const flat40 = curve([
      [700, 40],
      [1000, 40],
    ]);
    const radiation = part(1, { gamma: vswr3, efficiency: flat40, efficiencyBasis: 'radiation' });
    const total = part(2, { gamma: vswr3, efficiency: flat40, efficiencyBasis: 'total' });
    // η_tot = η_rad (1 − |Γ|²) = 40 % × 0.75 = 30 % (IEEE Std 145-2013 definitions, from memory).
    expect(meetsCoverage(radiation, { ...b8, minEfficiencyPct: 30 })).toBe(true);
    expect(meetsCoverage(radiation, { ...b8, minEfficiencyPct: 30.01 })).toBe(false);
    expect(meetsCoverage(total, { ...b8, minEfficiencyPct: 40 })).toBe(true);
    expect(meetsCoverage(total, { ...b8, minEfficiencyPct: 40.01 })).toBe(false);
  });

  it('reads each spec band by its own basis', () => {
    const spec = part(3, { specBands: [band(870, 970, 3, 40, null, 'radiation')] });
    expect(meetsCoverage(spec, { ...b8, minEfficiencyPct: 30 })).toBe(true);
    expect(meetsCoverage(spec, { ...b8, minEfficiencyPct: 30.01 })).toBe(false);
  });

  it('checks each range of a band, so a part that misses only the duplex gap is found, as the matrix judges it', () => {
    // 3GPP TS 36.101 Table 5.5-1: band 8 UL 880–915 MHz, DL 925–960 MHz; the part is mismatched (|Γ| 0.9) only between them.
    const gamma = curve([
      [850, 0.2],
      [915, 0.2],
      [918, 0.9],
      [922, 0.9],
      [925, 0.2],
      [990, 0.2],
    ]);
    const efficiency = curve([
      [850, 50],
      [990, 50],
    ]);
    const indexed = part(4, { gamma, efficiency, efficiencyBasis: 'total' });
    const query = { ranges: [rangeMhz(880, 915), rangeMhz(925, 960)], vswrMax: 2, minEfficiencyPct: 50 };
    expect(meetsCoverage(indexed, query)).toBe(true);
    // One span from the lowest to the highest edge would have turned it away.
    expect(meetsCoverage(indexed, { ...query, ranges: [rangeMhz(880, 960)] })).toBe(false);
    const facts = computeFacts(
      constructedRequirement({ designation: 'B8', ranges: [rangeMhz(880, 915, 'uplink'), rangeMhz(925, 960, 'downlink')] }),
      constructedPartForIndex(indexed),
    );
    expect(facts.coverageAtVswr2Pct).toBe(100);
    expect(facts.minTotalEfficiencyPct).toBe(50);
  });
});

/** The same data as the rules engine reads it. */
function constructedPartForIndex(p: IndexedPart) {
  const frequenciesHz = Float64Array.from(p.gamma!.frequenciesHz);
  return {
    partId: p.id,
    mpn: p.mpn,
    title: p.title,
    reflection: reflectionCurveFromGamma(frequenciesHz, Float64Array.from(p.gamma!.values), new Float64Array(frequenciesHz.length)),
    efficiencyPercent: p.efficiency,
    efficiencyBasis: p.efficiencyBasis,
    peakGainDbi: null,
    gainBasis: 'peak' as const,
    averageGainDbi: null,
    specBands: [],
    evaluationGroundPlane: null,
    polarization: 'linear' as const,
    reviewState: 'approved' as const,
    lifecycle: 'active' as const,
  };
}
