import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { constructedPart, constructedRequirement, rangeMhz, reflectionFromVswr } from './fixtures';
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

describe(`${rankCandidates.name} explanations`, () => {
  const b12 = constructedRequirement();
  // 3GPP TS 36.101 Table 5.5-1: band 3 UL 1710–1785, DL 1805–1880 MHz.
  const b3 = constructedRequirement({ bandId: 3, designation: 'B3', ranges: [rangeMhz(1710, 1785, 'uplink'), rangeMhz(1805, 1880, 'downlink')] });
  const failingTitles = ['Band not covered', 'Efficiency below floor', 'Efficiency below target', 'VSWR above target'];

  it('heads a failing part with the finding that fails it, the band match before the efficiency that follows from it', () => {
    // VSWR 8 everywhere: nothing is matched at 3:1, and 5 % efficiency is also under the floor.
    const [part] = rankCandidates([b12], [constructedPart({ vswr: 8, efficiencyPercent: 5 })], RULES);
    expect(part.status).toBe('fail');
    expect(part.bands[0].findings.map((f) => f.code)).toEqual(expect.arrayContaining(['BAND_NOT_COVERED', 'EFFICIENCY_BELOW_FLOOR']));
    expect(part.explanation).toMatchObject({ status: 'fail', title: 'Band not covered', designation: 'B12', finding: { code: 'BAND_NOT_COVERED' } });
    expect(part.explanation.text).toMatch(/^B12: VSWR ≤ 3:1 covers only 0 % of B12/);
  });

  it('names the band furthest from being covered: 0 % of B3 before a partly covered B12', () => {
    // Matched (VSWR 1.5) up to 720 MHz, VSWR 8 above: B12 (699–746 MHz) is partly covered, B3 not at all.
    const reflection = reflectionFromVswr([600e6, 720e6, 721e6, 3000e6], [1.5, 1.5, 8, 8]);
    const [part] = rankCandidates([b12, b3], [constructedPart({}, { reflection })], RULES);
    expect(part.bands.map((b) => b.decidingFinding?.code)).toEqual(['BAND_NOT_COVERED', 'BAND_NOT_COVERED']);
    expect(part.explanation).toMatchObject({ title: 'Band not covered', designation: 'B3', bandId: 3 });
    expect(part.explanation.finding!.message).toContain('covers only 0 % of B3');
  });

  it('heads a passing part with its nearest limit, never with a failing-sounding title', () => {
    const [part] = rankCandidates([b12], [constructedPart({ vswr: 1.9 })], RULES);
    expect(part.status).toBe('pass');
    expect(part.explanation).toMatchObject({ status: 'pass', title: 'Nearest limit', finding: null, designation: 'B12' });
    expect(failingTitles).not.toContain(part.explanation.title);
    expect(part.explanation.text).toMatch(/^B12: highest VSWR in the band 1\.9 against the limit 2 \([\d.]+ dB inside\)$/);
    for (const band of part.bands) expect(band.decidingFinding).toBeNull();
  });

  it('ranks by fit after status and before margin: a worse-fitting part with more margin comes second', () => {
    const wide = constructedPart({ vswr: 1.2 }, { partId: 1, mpn: 'WIDE-N-PANEL' });
    const tight = constructedPart({ vswr: 1.9 }, { partId: 2, mpn: 'TIGHT-SOLDER' });
    const failing = constructedPart({ vswr: 8 }, { partId: 3, mpn: 'FAILING-SOLDER' });
    const fit = (p: { partId: number }) => (p.partId === 1 ? 2 : 0);
    expect(rankCandidates([b12], [wide, tight, failing], RULES).map((c) => c.mpn)).toEqual(['WIDE-N-PANEL', 'TIGHT-SOLDER', 'FAILING-SOLDER']);
    const ranked = rankCandidates([b12], [wide, tight, failing], RULES, { fitRank: fit });
    expect(ranked.map((c) => [c.mpn, c.fitRank])).toEqual([
      ['TIGHT-SOLDER', 0],
      ['WIDE-N-PANEL', 2],
      ['FAILING-SOLDER', 0],
    ]);
  });
});
