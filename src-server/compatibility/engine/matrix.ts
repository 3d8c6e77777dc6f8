import { FACT_CATALOG, isFactName } from './fact-catalog';
import { CompiledRuleSet } from './compiled-evaluator';
import { computeFacts, computeRowFacts } from './compute-facts';
import { formatValue, statusRank, worseStatus } from './rule-binding';
import type { BoundRule } from './rule-binding';
import type { Margin } from './margin';
import type { CellStatus, CellVerdict, Facts, Finding, PartEvaluationData, RadioBandRequirement } from './types';

export interface MatrixRow {
  readonly radioId: number;
  readonly radioName: string;
  readonly technology: string;
  readonly bandId: number;
  readonly designation: string;
  readonly ranges: readonly { readonly fromMhz: number; readonly toMhz: number; readonly role: string }[];
}

export interface MatrixColumn {
  readonly partId: number;
  readonly mpn: string;
  readonly title: string;
}

export interface MatrixCell {
  /** Index into rows. */
  readonly row: number;
  /** Index into columns. */
  readonly column: number;
  readonly status: CellStatus;
  readonly findings: readonly Finding[];
}

export interface Matrix {
  readonly rows: readonly MatrixRow[];
  readonly columns: readonly MatrixColumn[];
  readonly cells: readonly MatrixCell[];
}

/**
 * Facts of (row × part) pairs, kept while neither changes: the part's `cacheKey` moves with its data,
 * the row key with the requirement. Oldest entries leave first once `capacity` is reached.
 */
export class FactsCache {
  /** Row key → part key → facts: the long row key is hashed once per row, not once per pair. */
  private readonly rows = new Map<string, Map<string, Facts>>();
  private count = 0;

  constructor(private readonly capacity = 400_000) {}

  get size(): number {
    return this.count;
  }

  forRow(rowKey: string): Map<string, Facts> {
    let row = this.rows.get(rowKey);
    if (!row) {
      row = new Map();
      this.rows.set(rowKey, row);
    }
    return row;
  }

  getOrCompute(row: Map<string, Facts>, partKey: string, compute: () => Facts): Facts {
    const hit = row.get(partKey);
    if (hit) return hit;
    const facts = compute();
    if (this.count >= this.capacity) this.clear();
    row.set(partKey, facts);
    this.count += 1;
    return facts;
  }

  clear(): void {
    for (const row of this.rows.values()) row.clear();
    this.count = 0;
  }
}

export function requirementKey(requirement: RadioBandRequirement): string {
  return JSON.stringify(requirement);
}

interface PreparedRow {
  readonly requirement: RadioBandRequirement;
  readonly rowFacts: Facts;
  readonly cached: Map<string, Facts> | null;
}

function prepare(requirements: readonly RadioBandRequirement[], cache: FactsCache | undefined): PreparedRow[] {
  return requirements.map((requirement) => ({
    requirement,
    rowFacts: computeRowFacts(requirement),
    cached: cache ? cache.forRow(requirementKey(requirement)) : null,
  }));
}

function pairFacts(row: PreparedRow, part: PartEvaluationData, cache: FactsCache | undefined, partKey: (part: PartEvaluationData) => string | null): Facts {
  const compute = () => computeFacts(row.requirement, part, row.rowFacts as Record<string, never>);
  const key = cache ? partKey(part) : null;
  return key === null ? compute() : cache!.getOrCompute(row.cached!, key, compute);
}

export interface EvaluationOptions {
  readonly cache?: FactsCache;
  /** A key that changes whenever the part's data changes (e.g. id and catalogue revision); null disables caching for the part. */
  readonly partKey?: (part: PartEvaluationData) => string | null;
}

const defaultPartKey = () => null;

export function matrixRow(requirement: RadioBandRequirement): MatrixRow {
  return {
    radioId: requirement.radioId,
    radioName: requirement.radioName,
    technology: requirement.technology,
    bandId: requirement.bandId,
    designation: requirement.designation,
    ranges: requirement.ranges.map((r) => ({ fromMhz: r.fromHz / 1e6, toMhz: r.toHz / 1e6, role: r.role })),
  };
}

/** Every radio band against every part, through the compiled rules. */
export function evaluateMatrix(
  requirements: readonly RadioBandRequirement[],
  parts: readonly PartEvaluationData[],
  rules: CompiledRuleSet,
  options: EvaluationOptions = {},
): Matrix {
  const rows = prepare(requirements, options.cache);
  const cells: MatrixCell[] = [];
  rows.forEach((row, r) => {
    const compiled = rules.forRow(row.rowFacts);
    parts.forEach((part, c) => {
      const verdict: CellVerdict = compiled.evaluate(pairFacts(row, part, options.cache, options.partKey ?? defaultPartKey));
      cells.push({ row: r, column: c, status: verdict.status, findings: verdict.findings });
    });
  });
  return { rows: requirements.map(matrixRow), columns: parts.map((p) => ({ partId: p.partId, mpn: p.mpn, title: p.title })), cells };
}

export interface DecidingFigure {
  readonly ruleId: string;
  readonly ruleTitle: string;
  readonly designation: string;
  readonly fact: string;
  readonly value: number;
  readonly threshold: number;
  /** dB inside the limit (negative: over it). */
  readonly marginDb: number;
  readonly text: string;
}

export interface Candidate {
  readonly partId: number;
  readonly mpn: string;
  readonly title: string;
  /** The worst cell over the radio's bands. */
  readonly status: CellStatus;
  /** The smallest margin over every limit and band, in dB; null when no numeric limit applies. */
  readonly marginDb: number | null;
  readonly deciding: DecidingFigure | null;
  readonly bands: readonly { readonly bandId: number; readonly designation: string; readonly status: CellStatus; readonly findings: readonly Finding[] }[];
}

function describeDeciding(ruleTitle: string, designation: string, fact: string, value: number, threshold: number, marginDb: number): string {
  const label = isFactName(fact) ? FACT_CATALOG[fact].description : fact;
  const side = marginDb >= 0 ? `${formatValue(marginDb)} dB inside` : `${formatValue(-marginDb)} dB beyond`;
  return `${ruleTitle} on ${designation}: ${label} ${formatValue(value)} against ${formatValue(threshold)} (${side})`;
}

/** Larger margins first; a part with no numeric limit after every part that has one. */
function byMarginDescending(a: number | null, b: number | null): number {
  const x = a ?? -Infinity;
  const y = b ?? -Infinity;
  return x === y ? 0 : y > x ? 1 : -1;
}

/**
 * The parts for one radio (all its bands), best first: by worst status over the bands, then by the
 * margin of the limit they are nearest to, the deciding figure. Ties keep the catalogue order.
 */
export function rankCandidates(
  requirements: readonly RadioBandRequirement[],
  parts: readonly PartEvaluationData[],
  rules: CompiledRuleSet,
  options: EvaluationOptions & { readonly limit?: number } = {},
): Candidate[] {
  const rows = prepare(requirements, options.cache);
  const compiledRows = rows.map((row) => rules.forRow(row.rowFacts));
  const partKey = options.partKey ?? defaultPartKey;
  // First pass over the whole catalogue: states and margins only, no finding is written. A part that fails a
  // band stops there: fail ranks last, so its margins only matter when fewer than `limit` parts do not fail.
  const limit = options.limit ?? parts.length;
  const assess = (part: PartEvaluationData, order: number, stopAtFail: boolean) => {
    let status: CellStatus = 'pass';
    let deciding: DecidingFigure | null = null;
    let designation = '';
    // One visitor per part, not one margins array per band: the ranking keeps only the nearest limit.
    const visit = (bound: BoundRule, margin: Margin) => {
      if (margin.fact === null || margin.value === null || margin.threshold === null || !Number.isFinite(margin.distanceDb)) return;
      // A fact of the band alone (the product's ground plane vs λ/4) is the same for every part: it cannot rank them.
      if (!isFactName(margin.fact) || FACT_CATALOG[margin.fact].scope === 'row') return;
      if (margin.value === (FACT_CATALOG[margin.fact] as { ideal?: number }).ideal) return;
      if (deciding === null || margin.distanceDb < deciding.marginDb) {
        deciding = {
          ruleId: bound.rule.id,
          ruleTitle: bound.rule.title,
          designation,
          fact: margin.fact,
          value: margin.value,
          threshold: margin.threshold,
          marginDb: margin.distanceDb,
          text: '',
        };
      }
    };
    for (let i = 0; i < rows.length; i++) {
      const facts = pairFacts(rows[i], part, options.cache, partKey);
      status = worseStatus(status, compiledRows[i].status(facts));
      if (stopAtFail && status === 'fail') return { part, order, status, deciding: null, complete: false };
      designation = rows[i].requirement.designation;
      compiledRows[i].visitMargins(facts, visit);
    }
    return { part, order, status, deciding: deciding as DecidingFigure | null, complete: true };
  };
  let ranked = parts.map((part, order) => assess(part, order, true));
  if (ranked.filter((r) => r.status !== 'fail').length < limit) {
    ranked = ranked.map((r) => (r.complete ? r : assess(r.part, r.order, false)));
  }
  ranked.sort(
    (a, b) =>
      statusRank(a.status) - statusRank(b.status) || byMarginDescending(a.deciding?.marginDb ?? null, b.deciding?.marginDb ?? null) || a.order - b.order,
  );
  // Second pass for the ones shown: their findings per band and the deciding figure in words.
  return ranked.slice(0, limit).map(({ part, status, deciding }) => ({
    partId: part.partId,
    mpn: part.mpn,
    title: part.title,
    status,
    marginDb: deciding ? deciding.marginDb : null,
    deciding: deciding
      ? { ...deciding, text: describeDeciding(deciding.ruleTitle, deciding.designation, deciding.fact, deciding.value, deciding.threshold, deciding.marginDb) }
      : null,
    bands: rows.map((row, i) => {
      const verdict = compiledRows[i].evaluate(pairFacts(row, part, options.cache, partKey));
      return { bandId: row.requirement.bandId, designation: row.requirement.designation, status: verdict.status, findings: verdict.findings };
    }),
  }));
}
