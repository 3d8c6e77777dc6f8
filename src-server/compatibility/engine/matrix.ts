import { FACT_CATALOG, isFactName } from './fact-catalog';
import { CompiledRuleSet, type CompiledRow } from './compiled-evaluator';
import { type DecidedCell, decidingCellOf, decidingFindingOf, findingTitle } from './deciding';
import { computeFacts, computeRowFacts } from './compute-facts';
import { formatValue, statusRank, worseStatus } from './rule-binding';
import type { BoundRule } from './rule-binding';
import type { Margin } from './margin';
import type { CellStatus, CellVerdict, Facts, Finding, PartEvaluationData, RadioBandRequirement, RangeRole, Technology } from './types';

export interface MatrixRow {
  readonly radioId: number;
  readonly radioName: string;
  readonly technology: Technology;
  readonly bandId: number;
  readonly designation: string;
  readonly ranges: readonly { readonly fromMhz: number; readonly toMhz: number; readonly role: RangeRole }[];
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

export interface PreparedRow {
  readonly requirement: RadioBandRequirement;
  readonly rowFacts: Facts;
  readonly cached: Map<string, Facts> | null;
}

export function prepare(requirements: readonly RadioBandRequirement[], cache: FactsCache | undefined): PreparedRow[] {
  return requirements.map((requirement) => ({
    requirement,
    rowFacts: computeRowFacts(requirement),
    cached: cache ? cache.forRow(requirementKey(requirement)) : null,
  }));
}

export function pairFacts(
  row: PreparedRow,
  part: PartEvaluationData,
  cache: FactsCache | undefined,
  partKey: (part: PartEvaluationData) => string | null,
): Facts {
  const compute = () => computeFacts(row.requirement, part, row.rowFacts as Record<string, never>);
  const key = cache ? partKey(part) : null;
  return key === null ? compute() : cache!.getOrCompute(row.cached!, key, compute);
}

export interface EvaluationOptions {
  readonly cache?: FactsCache;
  /** The columns (part indices) each row is evaluated against; default every part. */
  readonly columnsFor?: (requirement: RadioBandRequirement, row: number) => readonly number[];
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
    const columns = options.columnsFor ? options.columnsFor(row.requirement, r) : parts.map((_, c) => c);
    for (const c of columns) {
      const verdict: CellVerdict = compiled.evaluate(pairFacts(row, parts[c], options.cache, options.partKey ?? defaultPartKey));
      cells.push({ row: r, column: c, status: verdict.status, findings: verdict.findings });
    }
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

/** Why a candidate stands where it does: the finding that decides its rank, or for a pass the limit it is nearest to. */
export interface CandidateExplanation {
  readonly status: CellStatus;
  /** Short title: the deciding finding's, or "Nearest limit" / "Passes" for a pass (never a failing-sounding title). */
  readonly title: string;
  readonly text: string;
  /** Null for a pass. */
  readonly finding: Finding | null;
  readonly bandId: number | null;
  readonly designation: string | null;
}

export interface CandidateBand {
  readonly bandId: number;
  readonly designation: string;
  readonly status: CellStatus;
  readonly findings: readonly Finding[];
  readonly decidingFinding: Finding | null;
}

export interface Candidate {
  readonly partId: number;
  readonly mpn: string;
  readonly title: string;
  /** The worst cell over the radio's bands. */
  readonly status: CellStatus;
  /** How well the part fits the radio's feed and polarization (0 best), from options.fitRank. */
  readonly fitRank: number;
  /** The smallest margin over every limit and band, in dB; null when no numeric limit applies. */
  readonly marginDb: number | null;
  readonly deciding: DecidingFigure | null;
  readonly explanation: CandidateExplanation;
  readonly bands: readonly CandidateBand[];
}

function describeDeciding(designation: string, fact: string, value: number, threshold: number, marginDb: number): string {
  const label = isFactName(fact) ? FACT_CATALOG[fact].description : fact;
  const side = marginDb >= 0 ? `${formatValue(marginDb)} dB inside` : `${formatValue(-marginDb)} dB beyond`;
  return `${designation}: ${label} ${formatValue(value)} against the limit ${formatValue(threshold)} (${side})`;
}

/** Larger margins first; a part with no numeric limit after every part that has one. */
function byMarginDescending(a: number | null, b: number | null): number {
  const x = a ?? -Infinity;
  const y = b ?? -Infinity;
  return x === y ? 0 : y > x ? 1 : -1;
}

/** dB by which each fired fail/marginal rule of a cell holds (its margin), by rule id. */
export function firedMargins(row: CompiledRow, facts: Facts): Map<string, number> {
  const margins = new Map<string, number>();
  row.visitMargins(facts, (bound, margin) => {
    if (margin.distanceDb <= 0) margins.set(bound.rule.id, margin.distanceDb);
  });
  return margins;
}

/** The decided cell's finding and margin, for choosing between cells. */
export function decidedCell<T>(status: CellStatus, findings: readonly Finding[], margins: ReadonlyMap<string, number>, item: T): DecidedCell<T> {
  const deciding = decidingFindingOf(status, findings);
  return { status, deciding, overByDb: deciding ? (margins.get(deciding.ruleId) ?? null) : null, item };
}

function explain(
  status: CellStatus,
  deciding: DecidingFigure | null,
  bands: readonly (CandidateBand & { readonly margins: ReadonlyMap<string, number> })[],
  ruleTitles: ReadonlyMap<string, string>,
): CandidateExplanation {
  if (status !== 'pass') {
    const decided = decidingCellOf(bands.map((b) => decidedCell(b.status, b.findings, b.margins, b)));
    const finding = decided?.deciding ?? null;
    if (decided && finding) {
      return {
        status,
        title: findingTitle(finding.code, ruleTitles.get(finding.ruleId)),
        text: `${decided.item.designation}: ${finding.message}`,
        finding,
        bandId: decided.item.bandId,
        designation: decided.item.designation,
      };
    }
  }
  if (deciding) {
    const band = bands.find((b) => b.designation === deciding.designation) ?? null;
    return { status, title: 'Nearest limit', text: deciding.text, finding: null, bandId: band?.bandId ?? null, designation: deciding.designation };
  }
  return { status, title: 'Passes', text: 'every band passes every check; no numeric limit applies', finding: null, bandId: null, designation: null };
}

/**
 * The parts for one radio (all its bands), best first: by worst status over the bands, then by how well
 * they fit the radio (feed and polarization, options.fitRank), then by the margin of the limit they are
 * nearest to, the deciding figure. Ties keep the catalogue order.
 */
export function rankCandidates(
  requirements: readonly RadioBandRequirement[],
  parts: readonly PartEvaluationData[],
  rules: CompiledRuleSet,
  options: EvaluationOptions & { readonly limit?: number; readonly fitRank?: (part: PartEvaluationData) => number } = {},
): Candidate[] {
  const rows = prepare(requirements, options.cache);
  const compiledRows = rows.map((row) => rules.forRow(row.rowFacts));
  const partKey = options.partKey ?? defaultPartKey;
  const fitRank = options.fitRank ?? (() => 0);
  const ruleTitles = new Map(rules.rules.map((r) => [r.id, r.title]));
  // First pass over the whole catalogue: states and margins only, no finding is written. A part that fails a
  // band stops there: fail ranks last, so its margins only matter when fewer than `limit` parts do not fail.
  const limit = options.limit ?? parts.length;
  const assess = (part: PartEvaluationData, order: number, stopAtFail: boolean) => {
    let status: CellStatus = 'pass';
    let deciding: DecidingFigure | null = null;
    let designation = '';
    const fit = fitRank(part);
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
      if (stopAtFail && status === 'fail') return { part, order, status, fit, deciding: null, complete: false };
      designation = rows[i].requirement.designation;
      compiledRows[i].visitMargins(facts, visit);
    }
    return { part, order, status, fit, deciding: deciding as DecidingFigure | null, complete: true };
  };
  let ranked = parts.map((part, order) => assess(part, order, true));
  if (ranked.filter((r) => r.status !== 'fail').length < limit) {
    ranked = ranked.map((r) => (r.complete ? r : assess(r.part, r.order, false)));
  }
  ranked.sort(
    (a, b) =>
      statusRank(a.status) - statusRank(b.status) ||
      a.fit - b.fit ||
      byMarginDescending(a.deciding?.marginDb ?? null, b.deciding?.marginDb ?? null) ||
      a.order - b.order,
  );
  // Second pass for the ones shown: their findings per band, the deciding finding and figure in words.
  return ranked.slice(0, limit).map(({ part, status, fit, deciding }) => {
    const figure = deciding
      ? { ...deciding, text: describeDeciding(deciding.designation, deciding.fact, deciding.value, deciding.threshold, deciding.marginDb) }
      : null;
    const bands = rows.map((row, i) => {
      const facts = pairFacts(row, part, options.cache, partKey);
      const verdict = compiledRows[i].evaluate(facts);
      return {
        bandId: row.requirement.bandId,
        designation: row.requirement.designation,
        status: verdict.status,
        findings: verdict.findings,
        decidingFinding: decidingFindingOf(verdict.status, verdict.findings),
        margins: verdict.status === 'pass' ? new Map<string, number>() : firedMargins(compiledRows[i], facts),
      };
    });
    return {
      partId: part.partId,
      mpn: part.mpn,
      title: part.title,
      status,
      fitRank: fit,
      marginDb: figure ? figure.marginDb : null,
      deciding: figure,
      explanation: explain(status, figure, bands, ruleTitles),
      bands: bands.map(({ margins: _margins, ...band }) => band),
    };
  });
}
