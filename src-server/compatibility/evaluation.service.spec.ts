import { bandFacts } from './evaluation.service';

describe(bandFacts.name, () => {
  it('works out system efficiency from total efficiency and the feed loss when the engine gives none: η_tot × 10^(−L/10)', () => {
    // rf-reference §3.3 (definition of the decibel): −3 dB = 50.1 %; 1 dB = 79.4 %.
    expect(bandFacts({ minTotalEfficiencyPct: 50 }, 3).minSystemEfficiencyPct).toBeCloseTo(25.059, 3);
    expect(bandFacts({ minTotalEfficiencyPct: 100 }, 1).minSystemEfficiencyPct).toBeCloseTo(79.433, 3);
    expect(bandFacts({ minTotalEfficiencyPct: 40 }, 0).minSystemEfficiencyPct).toBe(40);
  });

  it("takes the engine's own system efficiency when it has one, and leaves unknown facts null, not zero", () => {
    expect(bandFacts({ minTotalEfficiencyPct: 50, minSystemEfficiencyPct: 44 }, 3).minSystemEfficiencyPct).toBe(44);
    expect(bandFacts({ coverageAtVswr3Pct: 62.5, worstVswr: null }, 0.5)).toMatchObject({
      coverageFraction: 0.625,
      coverageVswr: 3,
      worstVswr: null,
      minTotalEfficiencyPct: null,
      minSystemEfficiencyPct: null,
      feedLossDb: 0.5,
    });
    expect(bandFacts(null, 0.2).eirpDbm).toBeNull();
  });
});
