import { FACT_CATALOG, isFactName } from './fact-catalog';
import type { RuleDefinition } from './rule-definition';
import {
  type BoundRule,
  type EngineCondition,
  EVALUATION_FAILED,
  PREPARATION_FAILED,
  bindOrBreak,
  bindingKeyOrBroken,
  brokenFindingOf,
  completeFacts,
  findingOf,
  noDataFindingOf,
  ruleDefect,
  verdictOf,
} from './rule-binding';
import { factsNamedBy } from './rule-definition';
import { type Margin, marginOf } from './margin';
import type { CellStatus, CellVerdict, Facts, Finding } from './types';
import { OPERATORS } from './operators';

export type Predicate = (facts: Facts) => boolean;

/** A condition tree as a plain JavaScript function; empty "all" and "any" are true, as in json-rules-engine. */
export function compileCondition(node: EngineCondition): Predicate {
  if ('all' in node) {
    const parts = node.all.map(compileCondition);
    if (parts.length === 1) return parts[0];
    return (facts) => {
      for (const p of parts) if (!p(facts)) return false;
      return true;
    };
  }
  if ('any' in node) {
    const parts = node.any.map(compileCondition);
    if (parts.length === 0) return () => true;
    if (parts.length === 1) return parts[0];
    return (facts) => {
      for (const p of parts) if (p(facts)) return true;
      return false;
    };
  }
  if ('not' in node) {
    const inner = compileCondition(node.not);
    return (facts) => !inner(facts);
  }
  const op = OPERATORS[node.operator];
  if (!op) throw new Error(`unknown operator "${node.operator}"`);
  const { cb, validator } = op;
  const fact = node.fact;
  const value = node.value;
  if (typeof value === 'object' && value !== null && !Array.isArray(value) && 'fact' in value) {
    const other = (value as { fact: string }).fact;
    return (facts) => {
      const a = facts[fact];
      return validator(a) && cb(a, facts[other]);
    };
  }
  return (facts) => {
    const a = facts[fact];
    return validator(a) && cb(a, value);
  };
}

interface CompiledRule {
  /** Null for a sound rule; a faulty one carries the finding every cell of the row gets instead. */
  readonly broken: null;
  readonly bound: BoundRule;
  /** Null when the rule applies to every pair of the row (decided once, from the row's facts). */
  readonly applies: Predicate | null;
  readonly fires: Predicate;
  readonly required: readonly string[];
}

interface BrokenRule {
  readonly broken: Finding;
}

/** The rules bound to one row, with rules that cannot apply to the row already dropped. */
export class CompiledRow {
  readonly rules: readonly (CompiledRule | BrokenRule)[];

  constructor(bound: readonly (BoundRule | BrokenRule)[], rowFacts: Facts) {
    const rules: (CompiledRule | BrokenRule)[] = [];
    for (const b of bound) {
      if ('broken' in b) {
        rules.push(b);
        continue;
      }
      try {
        let applies = b.appliesWhen ? compileCondition(b.appliesWhen) : null;
        const onlyRowFacts = b.appliesWhen !== null && factsNamedBy(b.rule.appliesWhen).every((f) => isFactName(f) && FACT_CATALOG[f].scope === 'row');
        if (applies && onlyRowFacts) {
          if (!applies(rowFacts)) continue;
          applies = null;
        }
        rules.push({ broken: null, bound: b, applies, fires: compileCondition(b.conditions), required: b.requiredFacts });
      } catch {
        rules.push({ broken: brokenFindingOf(b.rule, PREPARATION_FAILED) });
      }
    }
    this.rules = rules;
  }

  /** Facts must be complete (every catalogue fact present, unknown as null). A rule that throws marks the cell, never the response. */
  evaluate(facts: Facts): CellVerdict {
    const findings: Finding[] = [];
    for (const r of this.rules) {
      if (r.broken !== null) {
        findings.push(r.broken);
        continue;
      }
      try {
        if (r.applies && !r.applies(facts)) continue;
        if (!knowsAll(r.required, facts)) findings.push(noDataFindingOf(r.bound, facts));
        else if (r.fires(facts)) findings.push(findingOf(r.bound, facts));
      } catch {
        findings.push(brokenFindingOf(r.bound.rule, EVALUATION_FAILED));
      }
    }
    return verdictOf(findings);
  }

  /** The cell's state alone, with no finding written: the same decisions as evaluate(), for ranking a whole catalogue. */
  status(facts: Facts): CellStatus {
    let noData = false;
    let marginal = false;
    for (const r of this.rules) {
      if (r.broken !== null) {
        noData = true;
        continue;
      }
      try {
        if (r.applies && !r.applies(facts)) continue;
        if (!knowsAll(r.required, facts)) noData = true;
        else if (r.fires(facts)) {
          const severity = r.bound.rule.severity;
          if (severity === 'fail') return 'fail';
          if (severity === 'marginal') marginal = true;
        }
      } catch {
        noData = true;
      }
    }
    return noData ? 'no-data' : marginal ? 'marginal' : 'pass';
  }

  /** Visits the margin of each fail and marginal rule that applies and has its facts; info rules set no limit. */
  visitMargins(facts: Facts, visit: (bound: BoundRule, margin: Margin) => void): void {
    for (const r of this.rules) {
      // A faulty rule sets no limit: its cells are already "not checked".
      if (r.broken !== null || r.bound.rule.severity === 'info') continue;
      let margin: Margin;
      try {
        if (r.applies && !r.applies(facts)) continue;
        if (!knowsAll(r.required, facts)) continue;
        margin = marginOf(r.bound.conditions, facts);
      } catch {
        continue;
      }
      visit(r.bound, margin);
    }
  }
}

function knowsAll(required: readonly string[], facts: Facts): boolean {
  for (const name of required) if (facts[name] === null) return false;
  return true;
}

/**
 * The fast path: rule conditions compiled to closures, bound once per distinct row binding
 * (e.g. per technology for per-technology tables) and cached; verdicts equal ReferenceEvaluator's.
 */
export class CompiledRuleSet {
  readonly rules: readonly RuleDefinition[];
  /** Per rule, why it is faulty (checked once, as ReferenceEvaluator does), or null. */
  private readonly defects: readonly (string | null)[];
  private readonly rows = new Map<string, CompiledRow>();

  constructor(rules: readonly RuleDefinition[]) {
    this.rules = rules.filter((r) => r.enabled);
    this.defects = this.rules.map(ruleDefect);
  }

  forRow(rowFacts: Facts): CompiledRow {
    const complete = completeFacts(rowFacts);
    const key = this.rules.map((r, i) => bindingKeyOrBroken(r, i, this.defects[i], complete)).join('\n') + '\n' + rowKey(complete);
    let row = this.rows.get(key);
    if (!row) {
      row = new CompiledRow(
        this.rules.map((rule, index) => bindOrBreak(rule, index, this.defects[index], complete)),
        complete,
      );
      this.rows.set(key, row);
    }
    return row;
  }

  evaluate(facts: Facts): CellVerdict {
    const complete = completeFacts(facts);
    return this.forRow(complete).evaluate(complete);
  }
}

/** The row facts themselves: a row pre-filter decided on them must not be reused for another row. */
function rowKey(facts: Facts): string {
  let key = '';
  for (const name in FACT_CATALOG) if (FACT_CATALOG[name as keyof typeof FACT_CATALOG].scope === 'row') key += `${name}=${String(facts[name])};`;
  return key;
}
