import {
  bandStatistics,
  combinedBandStatistics,
  coverageOfBand,
  efficiencyInBand,
  evenlySpacedFrequencies,
  firstIndexAbove,
  gainInBand,
  interpolateAt,
  mergeRanges,
  rangesAtMost,
  resample,
} from './curves';

const MHZ = 1e6;
// Invented efficiency curve in %, 600..1000 MHz.
const efficiency = { frequenciesHz: [600 * MHZ, 700 * MHZ, 800 * MHZ, 1000 * MHZ], values: [20, 40, 60, 40] };

describe(interpolateAt.name, () => {
  it('is linear between samples and undefined outside the measured range', () => {
    expect(interpolateAt(efficiency, 650 * MHZ)).toBeCloseTo(30, 12);
    expect(interpolateAt(efficiency, 900 * MHZ)).toBeCloseTo(50, 12);
    expect(interpolateAt(efficiency, 600 * MHZ)).toBe(20);
    expect(interpolateAt(efficiency, 599 * MHZ)).toBeUndefined();
    expect(interpolateAt(efficiency, 1001 * MHZ)).toBeUndefined();
  });
  it('handles a single-point curve', () => {
    expect(interpolateAt({ frequenciesHz: [1e9], values: [7] }, 1e9)).toBe(7);
    expect(interpolateAt({ frequenciesHz: [1e9], values: [7] }, 1.1e9)).toBeUndefined();
  });
});

describe(resample.name, () => {
  it('gives NaN outside the range', () => {
    expect(Array.from(resample(efficiency, evenlySpacedFrequencies(500 * MHZ, 700 * MHZ, 3)))).toEqual([NaN, 20, 40]);
  });
});

describe(bandStatistics.name, () => {
  it('includes interpolated band edges in min, max and the frequency-weighted average', () => {
    const stats = bandStatistics(efficiency, { fromHz: 650 * MHZ, toHz: 900 * MHZ });
    expect(stats).toMatchObject({ status: 'ok', min: 30, minAtHz: 650 * MHZ, max: 60, maxAtHz: 800 * MHZ });
    // Trapezoids: 650-700 (30→40) 1750, 700-800 (40→60) 5000, 800-900 (60→50) 5500 → 12250 / 250.
    expect(stats.status === 'ok' && stats.average).toBeCloseTo(49, 12);
  });
  it('reports no data, never a pass, for a band partly or wholly outside the measured range', () => {
    expect(bandStatistics(efficiency, { fromHz: 550 * MHZ, toHz: 700 * MHZ })).toMatchObject({
      status: 'no-data',
      reason: expect.stringContaining('below the measured range'),
    });
    expect(bandStatistics(efficiency, { fromHz: 900 * MHZ, toHz: 1100 * MHZ })).toMatchObject({ status: 'no-data', reason: expect.stringContaining('above') });
    expect(bandStatistics(efficiency, { fromHz: 2e9, toHz: 3e9 }).status).toBe('no-data');
  });
  it('gives a constant code at once and the sentence on reading, also in JSON', () => {
    const below = bandStatistics(efficiency, { fromHz: 550 * MHZ, toHz: 700 * MHZ });
    expect(below).toMatchObject({ status: 'no-data', code: 'below-range' });
    expect(bandStatistics(efficiency, { fromHz: 900 * MHZ, toHz: 1100 * MHZ })).toMatchObject({ code: 'above-range' });
    expect(bandStatistics({ frequenciesHz: [], values: [] }, { fromHz: 1, toHz: 2 })).toMatchObject({ code: 'no-points', reason: 'the curve has no points' });
    expect(JSON.parse(JSON.stringify(below)).reason).toMatch(/starts at 550 MHz, below the measured range 600 MHz–1000 MHz/);
  });
  it('refuses a band with reversed edges', () => {
    expect(() => bandStatistics(efficiency, { fromHz: 900 * MHZ, toHz: 800 * MHZ })).toThrow(RangeError);
  });
});

describe(efficiencyInBand.name, () => {
  it('averages in linear power and shows dB: 50 % ↔ −3.01 dB', () => {
    const flat = { frequenciesHz: [1e9, 2e9], values: [50, 50] };
    const result = efficiencyInBand(flat, { fromHz: 1.2e9, toHz: 1.8e9 });
    expect(result.status === 'ok' && result.averageDb).toBeCloseTo(-3.01, 2);
    const twoLevels = efficiencyInBand({ frequenciesHz: [1e9, 1.5e9, 1.5e9 + 1, 2e9], values: [10, 10, 90, 90] }, { fromHz: 1e9, toHz: 2e9 });
    // Power average of 10 % and 90 % is 50 % (−3.01 dB), not the dB average (−5.23 dB).
    expect(twoLevels.status === 'ok' && twoLevels.averagePercent).toBeCloseTo(50, 5);
    expect(twoLevels.status === 'ok' && twoLevels.minDb).toBeCloseTo(-10, 9);
  });
});

describe(gainInBand.name, () => {
  it('averages dBi as linear power: 0 dBi and 10 dBi halves average to 7.40 dBi, not 5 (definition of the decibel)', () => {
    const result = gainInBand({ frequenciesHz: [1e9, 1.5e9, 1.5e9 + 1e-3, 2e9], values: [0, 0, 10, 10] }, { fromHz: 1e9, toHz: 2e9 });
    expect(result.status === 'ok' && result.averageDbi).toBeCloseTo(10 * Math.log10(5.5), 6);
    expect(result.status === 'ok' && result.peakDbi).toBe(10);
  });
});

describe(rangesAtMost.name, () => {
  it('interpolates both edges of each range', () => {
    const ranges = rangesAtMost([1, 2, 3, 4, 5], [3, 1, 1, 3, 1], 2);
    expect(ranges).toEqual([
      { fromHz: 1.5, toHz: 3.5 },
      { fromHz: 4.5, toHz: 5 },
    ]);
  });
});

describe(coverageOfBand.name, () => {
  it('reports the covered fraction and the gaps', () => {
    const coverage = coverageOfBand(
      [
        { fromHz: 0, toHz: 2 },
        { fromHz: 3, toHz: 4 },
      ],
      { fromHz: 1, toHz: 5 },
    );
    expect(coverage.coveredFraction).toBeCloseTo(0.5, 12);
    expect(coverage.uncoveredRanges).toEqual([
      { fromHz: 2, toHz: 3 },
      { fromHz: 4, toHz: 5 },
    ]);
  });
});

describe(combinedBandStatistics.name, () => {
  // Invented |Γ| curve on another grid than the efficiency curve, sharing the sample at 800 MHz.
  const gamma = { frequenciesHz: [650 * MHZ, 800 * MHZ, 900 * MHZ, 950 * MHZ], values: [0.5, 0.2, 0.3, 0.6] };
  const total = (percent: number, g: number) => percent * (1 - g * g);

  it('equals bandStatistics of the combined curve built on the edges and both grids, to the bit', () => {
    const band = { fromHz: 660 * MHZ, toHz: 940 * MHZ };
    const grid = [660, 700, 800, 900, 940].map((f) => f * MHZ);
    const combined = { frequenciesHz: grid, values: grid.map((f) => total(interpolateAt(efficiency, f)!, interpolateAt(gamma, f)!)) };
    for (const averaging of ['linear', 'power-of-db'] as const) {
      expect(combinedBandStatistics(efficiency, gamma, band, total, averaging)).toEqual(bandStatistics(combined, band, averaging));
    }
  });

  it('has no data where either curve stops', () => {
    expect(combinedBandStatistics(efficiency, gamma, { fromHz: 640 * MHZ, toHz: 700 * MHZ }, total)).toMatchObject({ status: 'no-data', code: 'below-range' });
  });
});

describe(mergeRanges.name, () => {
  it('sorts, joins overlapping and touching ranges, and keeps apart the disjoint ones', () => {
    expect(
      mergeRanges([
        { fromHz: 5, toHz: 6 },
        { fromHz: 1, toHz: 3 },
        { fromHz: 3, toHz: 4 },
        { fromHz: 2, toHz: 2.5 },
      ]),
    ).toEqual([
      { fromHz: 1, toHz: 4 },
      { fromHz: 5, toHz: 6 },
    ]);
    expect(mergeRanges([])).toEqual([]);
  });
});

describe(firstIndexAbove.name, () => {
  it('finds the first sample strictly above a frequency', () => {
    const f = [1, 2, 3, 4];
    expect([0, 1, 1.5, 2, 4, 5].map((x) => firstIndexAbove(f, x))).toEqual([0, 1, 1, 2, 4, 4]);
  });
});
