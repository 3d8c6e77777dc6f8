import { FACT_CATALOG, FACT_NAMES, isFactName } from './fact-catalog';
import { type ConditionNode, type ConditionValue, type ParameterValue, type RuleDefinition, factsNamedBy, validateRuleDefinition } from './rule-definition';
import type { CellStatus, CellVerdict, FactValue, Facts, Finding } from './types';

/** A condition as json-rules-engine takes it: parameters replaced by their values. */
export type EngineValue = number | string | boolean | null | readonly (number | string | boolean)[] | { readonly fact: string };
export type EngineCondition =
  | { readonly fact: string; readonly operator: string; readonly value: EngineValue }
  | { readonly all: readonly EngineCondition[] }
  | { readonly any: readonly EngineCondition[] }
  | { readonly not: EngineCondition };

/** A rule with its parameters resolved for one radio band (tables looked up by the row's facts). */
export interface BoundRule {
  readonly rule: RuleDefinition;
  /** Position in the rule set; findings are listed in this order. */
  readonly index: number;
  readonly values: Readonly<Record<string, ParameterValue>>;
  readonly appliesWhen: EngineCondition | null;
  readonly conditions: EngineCondition;
  /** Facts the conditions name: if one is null the pair has no data for this rule. */
  readonly requiredFacts: readonly string[];
  /** The message split once into text and placeholders, so a finding costs a few concatenations. */
  readonly template: readonly TemplatePiece[];
  readonly noDataCode: string;
  /** The rule's own "no data" findings per unknown fact, in the order the conditions name the facts. */
  readonly noData: readonly { readonly fact: string; readonly code: string; readonly template: readonly TemplatePiece[] }[];
}

type TemplatePiece = string | { readonly name: string; readonly upper: boolean; readonly fromParameters: boolean };

function parseTemplate(template: string, values: Readonly<Record<string, ParameterValue>>): TemplatePiece[] {
  const pieces: TemplatePiece[] = [];
  let last = 0;
  for (const m of template.matchAll(/\{([A-Za-z][A-Za-z0-9]*)(?:\|([a-z]+))?\}/g)) {
    if (m.index > last) pieces.push(template.slice(last, m.index));
    pieces.push({ name: m[1], upper: m[2] === 'upper', fromParameters: Object.prototype.hasOwnProperty.call(values, m[1]) });
    last = m.index + m[0].length;
  }
  if (last < template.length) pieces.push(template.slice(last));
  return pieces;
}

/** Which row facts pick table entries; two rows with the same values share one binding. */
export function bindingKey(rule: RuleDefinition, rowFacts: Facts): string {
  const keys = new Set<string>();
  const collect = (node: ConditionNode | null | undefined): void => {
    if (!node) return;
    if ('all' in node) node.all.forEach(collect);
    else if ('any' in node) node.any.forEach(collect);
    else if ('not' in node) collect(node.not);
    else if (typeof node.value === 'object' && node.value !== null && 'param' in node.value && node.value.key) keys.add(node.value.key);
  };
  collect(rule.appliesWhen);
  collect(rule.conditions);
  return (
    `${rule.id}@${rule.version}` +
    [...keys]
      .sort()
      .map((k) => `|${k}=${String(rowFacts[k])}`)
      .join('')
  );
}

function lookup(rule: RuleDefinition, param: string, key: string | undefined, facts: Facts): ParameterValue {
  const value = rule.parameters[param];
  if (key === undefined) return value;
  const table = value as Readonly<Record<string, number | string | boolean>>;
  const entry = String(facts[key]);
  return Object.prototype.hasOwnProperty.call(table, entry) ? table[entry] : table.default;
}

function bindValue(rule: RuleDefinition, value: ConditionValue, facts: Facts, used: Record<string, ParameterValue>): EngineValue {
  if (typeof value === 'object' && value !== null && !Array.isArray(value) && 'param' in value) {
    const bound = lookup(rule, value.param, value.key, facts);
    used[value.param] = bound;
    return bound as EngineValue;
  }
  return value as EngineValue;
}

function bindNode(rule: RuleDefinition, node: ConditionNode, facts: Facts, used: Record<string, ParameterValue>): EngineCondition {
  if ('all' in node) return { all: node.all.map((n) => bindNode(rule, n, facts, used)) };
  if ('any' in node) return { any: node.any.map((n) => bindNode(rule, n, facts, used)) };
  if ('not' in node) return { not: bindNode(rule, node.not, facts, used) };
  return { fact: node.fact, operator: node.operator, value: bindValue(rule, node.value, facts, used) };
}

export function bindRule(rule: RuleDefinition, index: number, rowFacts: Facts): BoundRule {
  const values: Record<string, ParameterValue> = { ...rule.parameters };
  const used: Record<string, ParameterValue> = {};
  const appliesWhen = rule.appliesWhen ? bindNode(rule, rule.appliesWhen, rowFacts, used) : null;
  const conditions = bindNode(rule, rule.conditions, rowFacts, used);
  const bound = { ...values, ...used };
  const named = factsNamedBy(rule.conditions);
  return {
    rule,
    index,
    values: bound,
    appliesWhen,
    conditions,
    requiredFacts: factsNamedBy(rule.conditions),
    template: parseTemplate(rule.event.params.message, bound),
    noDataCode: `${rule.event.params.code}_NO_DATA`,
    noData: Object.entries(rule.event.params.noData ?? {})
      .map(([fact, entry]) => ({ fact, code: entry.code, template: parseTemplate(entry.message, bound) }))
      .sort((a, b) => named.indexOf(a.fact) - named.indexOf(b.fact)),
  };
}

/** Every catalogue fact present, unknown ones as null, so json-rules-engine never meets an undefined fact. */
export function completeFacts(facts: Facts): Record<string, FactValue> {
  const complete: Record<string, FactValue> = {};
  for (const name of FACT_NAMES) complete[name] = facts[name] ?? null;
  return complete;
}

export function formatValue(value: unknown): string {
  if (value === null || value === undefined) return 'unknown';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) return Number.isNaN(value) ? 'unknown' : value > 0 ? '∞' : '−∞';
    return String(Number(value.toFixed(Math.abs(value) >= 100 ? 1 : 2)));
  }
  if (Array.isArray(value)) return value.map(formatValue).join(', ');
  if (typeof value === 'object')
    return Object.entries(value)
      .map(([k, v]) => `${k} ${formatValue(v)}`)
      .join(', ');
  return String(value);
}

/** Fills {name} and {name|upper} from the bound parameters first, then from the facts. */
export function renderMessage(bound: BoundRule, facts: Facts, template: readonly TemplatePiece[] = bound.template): string {
  let out = '';
  for (const piece of template) {
    if (typeof piece === 'string') out += piece;
    else {
      const text = formatValue(piece.fromParameters ? bound.values[piece.name] : facts[piece.name]);
      out += piece.upper ? text.toUpperCase() : text;
    }
  }
  return out;
}

/**
 * The message is written when first read (an own, enumerable getter, so JSON and deep equality see it):
 * ranking a whole catalogue reads the states of every pair but the words of only a few.
 */
function lazyFinding(ruleId: string, severity: Finding['severity'], code: string, write: () => string): Finding {
  let message: string | undefined;
  return {
    ruleId,
    severity,
    code,
    get message() {
      if (message === undefined) {
        // Written while the answer is serialised: a throw here would turn the whole response into a 500.
        try {
          message = write();
        } catch {
          message = 'the message of this finding could not be written';
        }
      }
      return message;
    },
  };
}

/** The code of the finding a rule gets on every cell it could not check because the rule itself is faulty. */
export const RULE_BROKEN_CODE = 'RULE_BROKEN';
export const EVALUATION_FAILED = 'it failed while checking this pair';
export const PREPARATION_FAILED = 'it could not be prepared for this band';

/**
 * Why a rule cannot be evaluated (its first validation problem), or null when it is sound. A rule from the
 * database was validated when saved, but may predate a stricter check or have been written around the API.
 */
export function ruleDefect(rule: unknown): string | null {
  try {
    const [first] = validateRuleDefinition(rule);
    if (!first) return null;
    return first.path ? `${first.path}: ${first.message}` : first.message;
  } catch {
    return 'the rule cannot be read';
  }
}

/** "Not checked" (shown as no data, never as a pass), naming the faulty rule and why. */
export function brokenFindingOf(rule: RuleDefinition, reason: string): Finding {
  const id = typeof rule?.id === 'string' ? rule.id : String(rule?.id);
  const title = typeof rule?.title === 'string' ? rule.title : id;
  return {
    ruleId: id,
    severity: 'no-data',
    code: RULE_BROKEN_CODE,
    message: `rule "${title}" (${id}) is broken and was not checked: ${reason}; an admin must correct or disable it`,
  };
}

/** The rule bound to a row, or its broken finding when it is faulty or binding it throws. */
export function bindOrBreak(rule: RuleDefinition, index: number, defect: string | null, rowFacts: Facts): BoundRule | { readonly broken: Finding } {
  if (defect !== null) return { broken: brokenFindingOf(rule, defect) };
  try {
    return bindRule(rule, index, rowFacts);
  } catch {
    return { broken: brokenFindingOf(rule, PREPARATION_FAILED) };
  }
}

/** bindingKey, with a faulty rule (known by its position) keyed apart instead of read. */
export function bindingKeyOrBroken(rule: RuleDefinition, index: number, defect: string | null, rowFacts: Facts): string {
  if (defect !== null) return `#broken-${index}`;
  try {
    return bindingKey(rule, rowFacts);
  } catch {
    return `#broken-${index}`;
  }
}

export function findingOf(bound: BoundRule, facts: Facts): Finding {
  return lazyFinding(bound.rule.id, bound.rule.severity, bound.rule.event.params.code, () => renderMessage(bound, facts));
}

export function noDataFindingOf(bound: BoundRule, facts: Facts): Finding {
  const own = bound.noData.find((entry) => facts[entry.fact] === null || facts[entry.fact] === undefined);
  if (own) return lazyFinding(bound.rule.id, 'no-data', own.code, () => renderMessage(bound, facts, own.template));
  return lazyFinding(bound.rule.id, 'no-data', bound.noDataCode, () => {
    const unknown = bound.requiredFacts.filter((name) => facts[name] === null || facts[name] === undefined);
    const needs = unknown.map((name) => (isFactName(name) ? FACT_CATALOG[name].description : name)).join('; ');
    const missing = facts.missingData && facts.missingData !== 'none' ? ` (no ${facts.missingData} data for this band)` : '';
    return `cannot check "${bound.rule.title}": ${needs} is not known${missing}`;
  });
}

const STATUS_ORDER: Record<CellStatus, number> = { pass: 0, marginal: 1, 'no-data': 2, fail: 3 };

/** fail beats no-data beats marginal: an unchecked limit is worse than a known caveat, a broken one worse still. */
export function statusOf(findings: readonly Finding[]): CellStatus {
  let status: CellStatus = 'pass';
  for (const f of findings) {
    const s: CellStatus = f.severity === 'info' ? 'pass' : f.severity;
    if (STATUS_ORDER[s] > STATUS_ORDER[status]) status = s;
  }
  return status;
}

export function worseStatus(a: CellStatus, b: CellStatus): CellStatus {
  return STATUS_ORDER[a] >= STATUS_ORDER[b] ? a : b;
}

export function statusRank(status: CellStatus): number {
  return STATUS_ORDER[status];
}

export function verdictOf(findings: Finding[]): CellVerdict {
  return { status: statusOf(findings), findings };
}
