/**
 * Matrix benchmark (issue 6): a product of 8 radios and 30 bands against a 10,000-part catalogue, the
 * candidates call for one radio over the whole catalogue, and the rule-evaluation path next to a plain
 * JavaScript predicate loop over the same facts in the same run. Figures are printed, not asserted.
 * Run: npx tsc -p tsconfig.bench.json && node dist/bench/bench/matrix-bench.js
 */
import { loadRuleFiles } from '../compatibility/rule-files';
import { CompiledRuleSet } from '../compatibility/engine/compiled-evaluator';
import { computeFacts, computeRowFacts } from '../compatibility/engine/compute-facts';
import { FactsCache, evaluateMatrix, rankCandidates, requirementKey } from '../compatibility/engine/matrix';
import { ReferenceEvaluator } from '../compatibility/engine/reference-evaluator';
import { completeFacts } from '../compatibility/engine/rule-binding';
import { benchmarkProductRequirements } from './synthetic-product';
import type { CellStatus, Facts, PartEvaluationData, Polarization, ReviewState } from '../compatibility/engine/types';
import { reflectionCurveFromGamma } from '../rf/reflection';
import { generateBenchParts } from './catalogue-seed-10k';

const PARTS = Number(process.env.BENCH_PARTS ?? 10_000);

/** The catalogue engineer's 10,000-part benchmark generator (catalogue-seed-10k.ts), as evaluation data in memory. */
function benchmarkCatalogue(count: number): PartEvaluationData[] {
  return generateBenchParts(count, 100_001, [1, 2, 3, 4, 5, 6]).map((p) => ({
    partId: p.id,
    mpn: p.mpn,
    title: p.title,
    reflection: p.s11 ? reflectionCurveFromGamma(Float64Array.from(p.s11.f), Float64Array.from(p.s11.re), Float64Array.from(p.s11.im)) : null,
    efficiencyPercent: p.efficiency ? { frequenciesHz: Float64Array.from(p.efficiency.f), values: Float64Array.from(p.efficiency.v) } : null,
    efficiencyBasis: 'radiation' as const,
    peakGainDbi: null,
    gainBasis: 'peak' as const,
    averageGainDbi: null,
    specBands: p.specBands.map(([fromMhz, toMhz, maxVswr, efficiencyPercent]) => ({
      fromHz: fromMhz * 1e6,
      toHz: toMhz * 1e6,
      maxVswr,
      minReturnLossDb: null,
      efficiencyPercent,
      efficiencyBasis: 'radiation' as const,
      efficiencyStatistic: 'minimum' as const,
      peakGainDbi: null,
      averageGainDbi: null,
      gainBasis: 'peak' as const,
    })),
    evaluationGroundPlane: null,
    polarization: p.polarization as Polarization,
    reviewState: p.reviewState as ReviewState,
    lifecycle: p.lifecycle as PartEvaluationData['lifecycle'],
  }));
}
const REFERENCE_SAMPLE = 3_000;

function time<T>(run: () => T): { result: T; ms: number } {
  const start = process.hrtime.bigint();
  const result = run();
  return { result, ms: Number(process.hrtime.bigint() - start) / 1e6 };
}

async function timeAsync<T>(run: () => Promise<T>): Promise<{ result: T; ms: number }> {
  const start = process.hrtime.bigint();
  const result = await run();
  return { result, ms: Number(process.hrtime.bigint() - start) / 1e6 };
}

const FLOOR: Record<string, number> = { lte: 15, nr: 15, ism: 15 };
const TARGET: Record<string, number> = { lte: 40, nr: 40, ism: 40 };
const known = (...values: unknown[]) => values.every((v) => v !== null);

/** The starting rules written by hand as plain predicates: the yardstick for the evaluation path. */
function plainStatus(f: Facts): CellStatus {
  let fail = false;
  let marginal = false;
  let noData = false;
  const check = (needs: unknown[], fires: () => boolean, severity: 'fail' | 'marginal') => {
    if (!known(...needs)) noData = true;
    else if (fires() && severity === 'fail') fail = true;
    else if (fires()) marginal = true;
  };
  const technology = f.technology as string;
  check([f.coverageAtVswr3Pct], () => (f.coverageAtVswr3Pct as number) < 100, 'fail');
  check([f.worstVswr], () => (f.worstVswr as number) > 2, 'marginal');
  check([f.minTotalEfficiencyPct], () => (f.minTotalEfficiencyPct as number) < (FLOOR[technology] ?? 30), 'fail');
  check([f.minTotalEfficiencyPct], () => (f.minTotalEfficiencyPct as number) < (TARGET[technology] ?? 50), 'marginal');
  if (f.radioTransmits === true && f.certifiedMaxGainDbi !== null) check([f.gainOverCertifiedDb], () => (f.gainOverCertifiedDb as number) > 0, 'fail');
  if ((f.regionalLimitCount as number) > 0) check([f.regionalLimitMarginDb], () => (f.regionalLimitMarginDb as number) < 0, 'fail');
  check([f.groundPlaneVsQuarterWavePct], () => (f.groundPlaneVsQuarterWavePct as number) < 100, 'marginal');
  if (f.requiredPolarization === 'RHCP' || f.requiredPolarization === 'LHCP') {
    check([f.polarizationLossDb], () => (f.polarizationLossDb as number) > 1, 'marginal');
    check([f.polarizationLossDb], () => (f.polarizationLossDb as number) > 10, 'fail');
  }
  if (f.evalGroundPlaneKnown === true) check([f.groundPlaneVsEvalPct], () => (f.groundPlaneVsEvalPct as number) < 100, 'marginal');
  if (f.reviewState !== 'approved' && f.reviewState !== 'retired') marginal = true;
  if (f.reviewState === 'retired') fail = true;
  if (f.lifecycle === 'eol') fail = true;
  if (f.lifecycle === 'nrnd') marginal = true;
  return fail ? 'fail' : noData ? 'no-data' : marginal ? 'marginal' : 'pass';
}

async function main(): Promise<void> {
  const rules = loadRuleFiles();
  const requirements = benchmarkProductRequirements();
  const generated = time(() => benchmarkCatalogue(PARTS));
  const parts = generated.result;
  const pairs = requirements.length * parts.length;
  console.log(
    `catalogue: ${parts.length} generated parts (catalogue-seed-10k generator: 70 % with 201-point S11 and 41-point efficiency, the rest spec bands only) in ${generated.ms.toFixed(0)} ms; product: ${new Set(requirements.map((r) => r.radioId)).size} radios, ${requirements.length} bands; ${rules.length} rules`,
  );

  const compiled = new CompiledRuleSet(rules);
  const cache = new FactsCache(pairs + 1000);
  const partKey = (p: { partId: number }) => String(p.partId);

  // Only the counts are kept: 300,000 cells with their findings would not fit next to the facts cache.
  const countStatuses = (m: ReturnType<typeof evaluateMatrix>) => {
    const acc: Record<string, number> = {};
    for (const c of m.cells) acc[c.status] = (acc[c.status] ?? 0) + 1;
    return acc;
  };
  const approved = parts.filter((p) => p.reviewState === 'approved');
  const biggestRadio = [...new Set(requirements.map((r) => r.radioId))]
    .map((id) => requirements.filter((r) => r.radioId === id))
    .sort((a, b) => b.length - a.length)[0];
  // First, as in a server just after a catalogue change: no facts cached yet, and no 300,000-cell matrix in the heap.
  const candidateCache = new FactsCache(pairs + 1000);
  const candidatesCold = time(() => rankCandidates(biggestRadio, approved, compiled, { cache: candidateCache, partKey, limit: 20 }));
  const candidatesWarm = time(() => rankCandidates(biggestRadio, approved, compiled, { cache: candidateCache, partKey, limit: 20 }));
  const best = candidatesCold.result[0];
  console.log(
    `candidates for "${biggestRadio[0].radioName}" (${biggestRadio.length} bands) over ${approved.length} approved parts: cold ${candidatesCold.ms.toFixed(0)} ms, warm ${candidatesWarm.ms.toFixed(0)} ms (target < 1000 ms)`,
  );
  console.log(`  best: ${best.mpn} ${best.status}, ${best.deciding?.text ?? 'no numeric limit'}`);
  const cold = time(() => countStatuses(evaluateMatrix(requirements, parts, compiled, { cache, partKey })));
  const warm = time(() => countStatuses(evaluateMatrix(requirements, parts, compiled, { cache, partKey })));
  const counts = cold.result;
  console.log(
    `matrix ${requirements.length} bands x ${parts.length} parts = ${pairs} cells: cold (facts computed) ${cold.ms.toFixed(0)} ms (${((pairs / cold.ms) * 1000).toFixed(0)} cells/s); warm (facts cached) ${warm.ms.toFixed(0)} ms (${((pairs / warm.ms) * 1000).toFixed(0)} cells/s)`,
  );
  console.log(`  statuses: ${JSON.stringify(counts)}`);
  // The same call again with the whole matrix's facts alive in the heap (garbage collection dominates then).
  const afterMatrix = time(() => rankCandidates(biggestRadio, approved, compiled, { cache: new FactsCache(pairs + 1000), partKey, limit: 20 }));
  console.log(`candidates again, cold, with the matrix's ${pairs} cached facts alive in the heap: ${afterMatrix.ms.toFixed(0)} ms`);

  // Evaluation only, same facts for both: the compiled rules against hand-written predicates.
  const facts: { row: number; facts: Facts }[] = [];
  requirements.forEach((requirement, row) => {
    const rowFacts = computeRowFacts(requirement);
    const cached = cache.forRow(requirementKey(requirement));
    for (const part of parts)
      facts.push({ row, facts: cache.getOrCompute(cached, String(part.partId), () => completeFacts(computeFacts(requirement, part, rowFacts))) });
  });
  const compiledRows = requirements.map((r) => compiled.forRow(computeRowFacts(r)));
  const rounds = 3;
  let evalMs = Infinity;
  let plainMs = Infinity;
  let mismatches = 0;
  for (let round = 0; round < rounds; round++) {
    const evaluated = time(() => facts.map((f) => compiledRows[f.row].status(f.facts)));
    const plain = time(() => facts.map((f) => plainStatus(f.facts)));
    evalMs = Math.min(evalMs, evaluated.ms);
    plainMs = Math.min(plainMs, plain.ms);
    if (round === 0) mismatches = evaluated.result.filter((s, i) => s !== plain.result[i]).length;
  }
  const findingSample = facts.filter((_, i) => i % 10 === 0);
  const withFindings = time(() => findingSample.reduce((n, f) => n + compiledRows[f.row].evaluate(f.facts).findings.length, 0));
  console.log(
    `evaluation over ${facts.length} precomputed (part x band) facts, best of ${rounds}: compiled rules (state) ${((facts.length / evalMs) * 1000).toFixed(0)} evals/s (${evalMs.toFixed(0)} ms), plain predicate loop ${((facts.length / plainMs) * 1000).toFixed(0)} evals/s (${plainMs.toFixed(0)} ms); ratio ${(evalMs / plainMs).toFixed(1)}x (target <= 10x); status mismatches ${mismatches}`,
  );
  console.log(
    `  compiled rules with every finding object (messages written on first read): ${((findingSample.length / withFindings.ms) * 1000).toFixed(0)} evals/s on every 10th pair`,
  );

  const reference = new ReferenceEvaluator(rules);
  const sample = facts.filter((_, i) => i % Math.ceil(facts.length / REFERENCE_SAMPLE) === 0);
  let differing = 0;
  const referenceRun = await timeAsync(async () => {
    for (const f of sample) {
      const verdict = await reference.evaluate(f.facts);
      if (JSON.stringify(verdict) !== JSON.stringify(compiledRows[f.row].evaluate(f.facts))) differing += 1;
    }
  });
  console.log(
    `json-rules-engine on ${sample.length} of the same pairs: ${((sample.length / referenceRun.ms) * 1000).toFixed(0)} evals/s; verdicts differing from the compiled path: ${differing}`,
  );
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
