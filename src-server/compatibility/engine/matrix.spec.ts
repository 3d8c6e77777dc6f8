import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { constructedPart, constructedRequirement } from './fixtures';
import { FactsCache, evaluateMatrix, rankCandidates } from './matrix';
import { statusRank } from './rule-binding';

const RULES = new CompiledRuleSet(loadRuleFiles());

describe(rankCandidates.name, () => {
  const requirement = constructedRequirement();

  it('ranks passes by the margin to their nearest limit and puts failures last', () => {
    const wide = constructedPart({ vswr: 1.2, efficiencyPercent: 70 }, { partId: 1, mpn: 'WIDE' });
    const tight = constructedPart({ vswr: 1.9, efficiencyPercent: 70 }, { partId: 2, mpn: 'TIGHT' });
    const failing = constructedPart({ vswr: 1.2, efficiencyPercent: 10 }, { partId: 3, mpn: 'LOW' });
    const ranked = rankCandidates([requirement], [failing, tight, wide], RULES);
    expect(ranked.map((c) => c.mpn)).toEqual(['WIDE', 'TIGHT', 'LOW']);
    // VSWR 1.9 against 2: return loss 10.16 vs 9.54 dB (Pozar 4th ed. §2.3), 0.62 dB inside.
    expect(ranked[1].deciding).toMatchObject({ ruleId: 'vswr-in-band', fact: 'worstVswr', value: 1.9, threshold: 2 });
    expect(ranked[1].marginDb!).toBeCloseTo(20 * Math.log10(2.9 / 0.9) - 20 * Math.log10(3), 6);
    expect(ranked[2].status).toBe('fail');
    expect(ranked[2].marginDb!).toBeLessThan(0);
  });

  it('never lets a fact of the band alone (ground plane vs λ/4) decide between parts', () => {
    const ranked = rankCandidates([requirement], [constructedPart({ vswr: 1.2 })], RULES);
    expect(ranked[0].deciding?.fact).not.toBe('groundPlaneVsQuarterWavePct');
  });

  it('never lets a fully covered band (coverage at its 100 % ceiling) decide the ranking', () => {
    const [only] = rankCandidates([requirement], [constructedPart({ vswr: 1.2 })], RULES);
    expect(only.deciding?.fact).not.toBe('coverageAtVswr3Pct');
  });
});

describe(`${rankCandidates.name} with a limit`, () => {
  const requirements = [constructedRequirement(), constructedRequirement({ bandId: 13, designation: 'B12 (second row)' })];
  // A catalogue where most parts fail (as in practice) and a few pass or are marginal.
  const catalogue = Array.from({ length: 40 }, (_, i) =>
    constructedPart({ vswr: [1.2, 1.6, 1.9, 2.4, 3.5, 5, 8][i % 7], efficiencyPercent: [70, 55, 35, 12, 60][i % 5] }, { partId: 100 + i, mpn: `P${i}` }),
  );
  const summary = (list: ReturnType<typeof rankCandidates>) => list.map((c) => [c.partId, c.status, c.marginDb, c.deciding?.ruleId ?? null]);

  /** Each part ranked on its own (no limit, no early stop at a failure), then sorted here: best status, larger margin, catalogue order. */
  const independentRanking = () =>
    catalogue
      .map((part, order) => ({ order, candidate: rankCandidates(requirements, [part], RULES)[0] }))
      .sort(
        (a, b) =>
          statusRank(a.candidate.status) - statusRank(b.candidate.status) ||
          (b.candidate.marginDb ?? -Infinity) - (a.candidate.marginDb ?? -Infinity) ||
          a.order - b.order,
      )
      .map((entry) => entry.candidate);

  it.each([3, 8, 39, 40])('top %i equals the top of an independent full ranking, also when failures must fill the list', (limit) => {
    const full = independentRanking();
    const limited = rankCandidates(requirements, catalogue, RULES, { limit });
    expect(limited).toHaveLength(limit);
    expect(summary(limited)).toEqual(summary(full).slice(0, limit));
    expect(limited.map((c) => c.bands)).toEqual(full.slice(0, limit).map((c) => c.bands));
  });

  it('has fewer non-failing parts than the larger limits here, so the fill-up path is exercised', () => {
    const full = rankCandidates(requirements, catalogue, RULES, { limit: catalogue.length });
    const notFailing = full.filter((c) => c.status !== 'fail').length;
    expect(notFailing).toBeGreaterThan(3);
    expect(notFailing).toBeLessThan(40);
  });
});

describe(evaluateMatrix.name, () => {
  it('gives one cell per band and part, and reuses cached facts on the second call', () => {
    const cache = new FactsCache();
    const parts = [constructedPart({}, { partId: 1 }), constructedPart({ vswr: 3.5 }, { partId: 2 })];
    const requirements = [constructedRequirement(), constructedRequirement({ bandId: 13, designation: 'B13' })];
    const first = evaluateMatrix(requirements, parts, RULES, { cache, partKey: (p) => String(p.partId) });
    expect(first.cells.map((c) => [c.row, c.column, c.status])).toEqual([
      [0, 0, 'pass'],
      [0, 1, 'fail'],
      [1, 0, 'pass'],
      [1, 1, 'fail'],
    ]);
    expect(cache.size).toBe(4);
    const second = evaluateMatrix(requirements, parts, RULES, { cache, partKey: (p) => String(p.partId) });
    expect(second).toEqual(first);
    expect(cache.size).toBe(4);
  });
});
