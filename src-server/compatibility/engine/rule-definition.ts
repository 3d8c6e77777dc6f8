import { Rule } from 'json-rules-engine';
import { FACT_CATALOG, isFactName } from './fact-catalog';
import { SEVERITIES, type Severity } from './types';

/** A scalar, a list of scalars, or a table keyed by a row fact (with a "default" entry). */
export type ParameterValue = number | string | boolean | readonly (number | string | boolean)[] | Readonly<Record<string, number | string | boolean>>;

/** A comparison value: a literal, another fact, or a parameter of the rule (optionally looked up by a row fact). */
export type ConditionValue =
  number | string | boolean | null | readonly (number | string | boolean)[] | { readonly fact: string } | { readonly param: string; readonly key?: string };

export interface LeafCondition {
  readonly fact: string;
  readonly operator: string;
  readonly value: ConditionValue;
}

export type ConditionNode =
  LeafCondition | { readonly all: readonly ConditionNode[] } | { readonly any: readonly ConditionNode[] } | { readonly not: ConditionNode };

/** One rule as it is stored in rules/<id>.json or in the database. */
export interface RuleDefinition {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  readonly severity: Severity;
  readonly enabled: boolean;
  readonly version: number;
  /** Where the threshold comes from: a standard, a book, or "common practice". */
  readonly source: string;
  readonly parameters: Readonly<Record<string, ParameterValue>>;
  /** When false (or when a fact it names is null) the rule does not apply to the pair at all. */
  readonly appliesWhen?: ConditionNode | null;
  /** The finding fires when these hold; every fact they name must be known, else the pair gets "no data". */
  readonly conditions: ConditionNode;
  readonly event: { readonly type: 'finding'; readonly params: FindingParams };
}

/** What a rule says when it fires, and (noData) what it says when a named fact of its conditions is unknown. */
export interface FindingParams {
  readonly code: string;
  readonly message: string;
  /**
   * Per fact the conditions name: the code and message of the "no data" finding when that fact is unknown (the first
   * unknown fact listed decides), so "no limit on file" reads apart from "no gain data". Others get `<code>_NO_DATA`.
   */
  readonly noData?: Readonly<Record<string, { readonly code: string; readonly message: string }>>;
}

export interface RuleProblem {
  /** Where in the rule, e.g. "conditions.all[1].fact". */
  readonly path: string;
  readonly message: string;
}

/** The operators of json-rules-engine 7 that the compiled path reproduces. */
export const SUPPORTED_OPERATORS = [
  'equal',
  'notEqual',
  'in',
  'notIn',
  'contains',
  'doesNotContain',
  'lessThan',
  'lessThanInclusive',
  'greaterThan',
  'greaterThanInclusive',
] as const;
const NUMERIC_OPERATORS = new Set(['lessThan', 'lessThanInclusive', 'greaterThan', 'greaterThanInclusive']);
const LIST_OPERATORS = new Set(['in', 'notIn']);

/** Limits on one rule, so no rule can make validation or evaluation recurse deeply or run long. */
export const RULE_LIMITS = { maxDepth: 8, maxConditions: 200, maxJsonBytes: 64 * 1024 } as const;

/** Names every plain object inherits (constructor, __proto__, toString, …): never a parameter, fact or table key. */
const INHERITED_NAMES: ReadonlySet<string> = new Set(Object.getOwnPropertyNames(Object.prototype));

const RULE_KEYS = new Set(['id', 'title', 'description', 'severity', 'enabled', 'version', 'source', 'parameters', 'appliesWhen', 'conditions', 'event']);
const PLACEHOLDER = /\{([A-Za-z][A-Za-z0-9]*)(?:\|([a-z]+))?\}/g;
export const MESSAGE_FILTERS = ['upper'] as const;

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isScalar = (v: unknown): v is number | string | boolean =>
  (typeof v === 'number' && Number.isFinite(v)) || typeof v === 'string' || typeof v === 'boolean';
const has = (object: object, key: string): boolean => Object.hasOwn(object, key);

/** What a parameter holds, in words, for the operator checks. */
function parameterKind(value: unknown): 'number' | 'text' | 'true/false' | 'list' | 'table' | 'nothing' {
  if (typeof value === 'number') return 'number';
  if (typeof value === 'string') return 'text';
  if (typeof value === 'boolean') return 'true/false';
  if (Array.isArray(value)) return 'list';
  return isRecord(value) ? 'table' : 'nothing';
}

/** Walk state shared by every condition of one rule: the count stops a rule of thousands of conditions early. */
interface WalkState {
  conditions: number;
  tooMany: boolean;
}

function validateParameter(name: string, value: unknown, problems: RuleProblem[]): void {
  const path = `parameters.${name}`;
  if (!/^[A-Z][A-Z0-9]*$/i.test(name)) problems.push({ path, message: 'a parameter name is letters and digits, starting with a letter' });
  else if (INHERITED_NAMES.has(name)) problems.push({ path, message: `"${name}" is a reserved name; choose another parameter name` });
  if (isScalar(value)) return;
  if (Array.isArray(value)) {
    value.forEach((item, i) => {
      if (!isScalar(item)) problems.push({ path: `${path}[${i}]`, message: 'list entries must be numbers, text or true/false' });
    });
    return;
  }
  if (isRecord(value)) {
    for (const [key, entry] of Object.entries(value)) {
      if (INHERITED_NAMES.has(key)) problems.push({ path: `${path}.${key}`, message: `"${key}" is a reserved name; it cannot be a table key` });
      else if (!isScalar(entry)) problems.push({ path: `${path}.${key}`, message: 'table entries must be numbers, text or true/false' });
    }
    if (!has(value, 'default')) problems.push({ path, message: 'a table needs a "default" entry for keys it does not list' });
    return;
  }
  problems.push({ path, message: 'must be a number, text, true/false, a list or a table' });
}

function validateValue(
  value: unknown,
  path: string,
  operator: string,
  factType: string | undefined,
  parameters: Record<string, unknown>,
  problems: RuleProblem[],
): void {
  const numeric = NUMERIC_OPERATORS.has(operator);
  const list = LIST_OPERATORS.has(operator);
  if (numeric && factType !== undefined && factType !== 'number')
    problems.push({ path, message: `operator "${operator}" compares numbers, and this fact is ${factType}` });
  if (isRecord(value)) {
    if (has(value, 'fact')) {
      if (Object.keys(value).length !== 1) problems.push({ path, message: 'a fact reference holds only "fact"' });
      if (typeof value.fact !== 'string' || !isFactName(value.fact)) {
        problems.push({ path: `${path}.fact`, message: `unknown fact "${String(value.fact)}"` });
        return;
      }
      // Every fact is one value, never a list, so "in" cannot take one; numeric comparisons need a numeric fact.
      if (list) problems.push({ path, message: `operator "${operator}" needs a list, and a fact is a single value` });
      const otherType = FACT_CATALOG[value.fact].type;
      if (numeric && otherType !== 'number')
        problems.push({ path: `${path}.fact`, message: `operator "${operator}" compares numbers, and "${value.fact}" is ${otherType}` });
      return;
    }
    if (has(value, 'param')) {
      const extra = Object.keys(value).filter((k) => k !== 'param' && k !== 'key');
      if (extra.length > 0) problems.push({ path, message: `a parameter reference holds only "param" and "key", not ${extra.join(', ')}` });
      if (typeof value.param !== 'string' || !has(parameters, value.param) || INHERITED_NAMES.has(value.param)) {
        problems.push({ path: `${path}.param`, message: `unknown parameter "${String(value.param)}"` });
        return;
      }
      const param = parameters[value.param];
      if (has(value, 'key')) {
        const key = String(value.key);
        if (typeof value.key !== 'string' || !isFactName(key)) problems.push({ path: `${path}.key`, message: `unknown fact "${key}"` });
        else if (FACT_CATALOG[key].scope !== 'row' || FACT_CATALOG[key].type !== 'string')
          problems.push({ path: `${path}.key`, message: `"${key}" cannot key a table: only text facts of the radio band can` });
        if (!isRecord(param)) problems.push({ path: `${path}.param`, message: `parameter "${value.param}" is not a table, so it takes no key` });
      } else if (isRecord(param)) {
        problems.push({ path, message: `parameter "${value.param}" is a table: name the fact that picks the entry with "key"` });
        return;
      }
      // What the comparison meets: the parameter itself, or any entry of its table.
      const kinds = isRecord(param) ? [...new Set(Object.values(param).map(parameterKind))] : [parameterKind(param)];
      if (list && kinds.some((k) => k !== 'list'))
        problems.push({ path: `${path}.param`, message: `operator "${operator}" needs a list, and parameter "${value.param}" holds ${kinds.join(' and ')}` });
      if (numeric && kinds.some((k) => k !== 'number'))
        problems.push({ path: `${path}.param`, message: `operator "${operator}" needs a number, and parameter "${value.param}" holds ${kinds.join(' and ')}` });
      if (!list && !numeric && kinds.includes('list'))
        problems.push({ path: `${path}.param`, message: `operator "${operator}" compares single values, and parameter "${value.param}" is a list` });
      return;
    }
    problems.push({ path, message: 'must be a number, text, true/false, null, a list, {"fact": …} or {"param": …}' });
    return;
  }
  if (list && !Array.isArray(value)) problems.push({ path, message: `operator "${operator}" needs a list` });
  if (numeric && !(typeof value === 'number' && Number.isFinite(value))) problems.push({ path, message: `operator "${operator}" needs a number` });
  if (!list && Array.isArray(value)) problems.push({ path, message: `operator "${operator}" compares single values, not a list` });
  if (!(value === null || isScalar(value) || (Array.isArray(value) && value.every(isScalar))))
    problems.push({ path, message: 'must be a number, text, true/false, null or a list of those' });
}

function validateCondition(node: unknown, path: string, depth: number, parameters: Record<string, unknown>, state: WalkState, problems: RuleProblem[]): void {
  if (state.tooMany) return;
  state.conditions += 1;
  if (state.conditions > RULE_LIMITS.maxConditions) {
    state.tooMany = true;
    problems.push({ path, message: `a rule holds at most ${RULE_LIMITS.maxConditions} conditions (appliesWhen and conditions together)` });
    return;
  }
  if (depth > RULE_LIMITS.maxDepth) {
    problems.push({ path, message: `conditions nest at most ${RULE_LIMITS.maxDepth} levels deep` });
    return;
  }
  if (!isRecord(node)) {
    problems.push({ path, message: 'a condition must be an object' });
    return;
  }
  const booleanKeys = ['all', 'any', 'not'].filter((k) => has(node, k));
  if (booleanKeys.length > 1) {
    problems.push({ path, message: `a condition holds one of "all", "any", "not", not ${booleanKeys.join(' and ')}` });
    return;
  }
  if (booleanKeys.length === 1) {
    const key = booleanKeys[0];
    const extra = Object.keys(node).filter((k) => k !== key);
    if (extra.length > 0) problems.push({ path, message: `unexpected ${extra.map((k) => `"${k}"`).join(', ')} beside "${key}"` });
    const inner = node[key];
    if (key === 'not') {
      if (Array.isArray(inner)) problems.push({ path: `${path}.not`, message: '"not" takes one condition, not a list' });
      else validateCondition(inner, `${path}.not`, depth + 1, parameters, state, problems);
    } else if (!Array.isArray(inner)) {
      problems.push({ path: `${path}.${key}`, message: `"${key}" takes a list of conditions` });
    } else {
      inner.forEach((child, i) => validateCondition(child, `${path}.${key}[${i}]`, depth + 1, parameters, state, problems));
    }
    return;
  }
  if (has(node, 'condition')) {
    problems.push({ path: `${path}.condition`, message: 'shared condition references are not supported; write the condition out' });
    return;
  }
  for (const k of Object.keys(node)) {
    if (k === 'path' || k === 'params') problems.push({ path: `${path}.${k}`, message: `"${k}" is not supported: facts here are plain values` });
    else if (k !== 'fact' && k !== 'operator' && k !== 'value') problems.push({ path: `${path}.${k}`, message: `unexpected "${k}"` });
  }
  const fact = node.fact;
  if (typeof fact !== 'string') problems.push({ path: `${path}.fact`, message: 'names a fact' });
  else if (!isFactName(fact)) problems.push({ path: `${path}.fact`, message: `unknown fact "${fact}"` });
  const operator = node.operator;
  if (typeof operator !== 'string' || !(SUPPORTED_OPERATORS as readonly string[]).includes(operator)) {
    problems.push({ path: `${path}.operator`, message: `unknown operator "${String(operator)}"; use one of ${SUPPORTED_OPERATORS.join(', ')}` });
  }
  if (!has(node, 'value')) problems.push({ path: `${path}.value`, message: 'a condition needs a value' });
  else
    validateValue(
      node.value,
      `${path}.value`,
      String(operator),
      typeof fact === 'string' && isFactName(fact) ? FACT_CATALOG[fact].type : undefined,
      parameters,
      problems,
    );
}

/** Placeholders {name} or {name|upper} in a message must name a fact or a parameter. */
export function messagePlaceholders(message: string): { name: string; filter: string | undefined }[] {
  return [...message.matchAll(PLACEHOLDER)].map((m) => ({ name: m[1], filter: m[2] }));
}

/**
 * Checks a rule before it is saved or loaded: our shape, our fact names, our parameters, and
 * json-rules-engine's own constructor. Returns every problem found, each with its place in the rule.
 */
export function validateRuleDefinition(input: unknown): RuleProblem[] {
  const problems: RuleProblem[] = [];
  if (!isRecord(input)) return [{ path: '', message: 'a rule must be a JSON object' }];
  const tooLarge = sizeProblem(input);
  if (tooLarge) return [tooLarge];
  for (const key of Object.keys(input)) if (!RULE_KEYS.has(key)) problems.push({ path: key, message: `unexpected field "${key}"` });
  if (typeof input.id !== 'string' || !/^[a-z0-9][a-z0-9-]{1,62}[a-z0-9]$/.test(input.id))
    problems.push({ path: 'id', message: 'lower-case letters, digits and dashes, 3 to 64 characters' });
  if (typeof input.title !== 'string' || input.title.trim().length === 0 || input.title.length > 120)
    problems.push({ path: 'title', message: 'text of 1 to 120 characters' });
  if (typeof input.description !== 'string' || input.description.length > 2000)
    problems.push({ path: 'description', message: 'text of at most 2000 characters' });
  if (typeof input.source !== 'string' || input.source.trim().length === 0 || input.source.length > 500)
    problems.push({ path: 'source', message: 'name where the threshold comes from (a standard, a book, or "common practice"), at most 500 characters' });
  if (!(SEVERITIES as readonly unknown[]).includes(input.severity)) problems.push({ path: 'severity', message: `one of ${SEVERITIES.join(', ')}` });
  if (typeof input.enabled !== 'boolean') problems.push({ path: 'enabled', message: 'true or false' });
  if (!Number.isInteger(input.version) || (input.version as number) < 1) problems.push({ path: 'version', message: 'a whole number from 1' });
  const parameters = isRecord(input.parameters) ? input.parameters : {};
  if (!isRecord(input.parameters)) problems.push({ path: 'parameters', message: 'an object of named thresholds (may be empty)' });
  else for (const [name, value] of Object.entries(input.parameters)) validateParameter(name, value, problems);
  const state: WalkState = { conditions: 0, tooMany: false };
  if (input.appliesWhen !== undefined && input.appliesWhen !== null) validateCondition(input.appliesWhen, 'appliesWhen', 1, parameters, state, problems);
  const conditions = input.conditions;
  if (!isRecord(conditions) || !['all', 'any', 'not'].some((k) => has(conditions, k))) {
    problems.push({ path: 'conditions', message: 'must hold "all", "any" or "not" at the top' });
  } else {
    validateCondition(conditions, 'conditions', 1, parameters, state, problems);
  }
  const event = input.event;
  if (!isRecord(event) || event.type !== 'finding' || !isRecord(event.params)) {
    problems.push({ path: 'event', message: 'must be {"type": "finding", "params": {"code": …, "message": …}}' });
  } else {
    for (const key of Object.keys(event.params))
      if (!['code', 'message', 'noData'].includes(key)) problems.push({ path: `event.params.${key}`, message: `unexpected field "${key}"` });
    validateCodeAndMessage(event.params, 'event.params', parameters, problems);
    const noData = event.params.noData;
    if (noData !== undefined) {
      const named = isRecord(conditions) ? factsNamedBy(conditions as unknown as ConditionNode) : [];
      if (!isRecord(noData)) problems.push({ path: 'event.params.noData', message: 'an object: fact name → {"code": …, "message": …}' });
      else
        for (const [fact, entry] of Object.entries(noData)) {
          const path = `event.params.noData.${fact}`;
          if (INHERITED_NAMES.has(fact) || !named.includes(fact)) problems.push({ path, message: `"${fact}" is not a fact the conditions name` });
          else if (!isRecord(entry)) problems.push({ path, message: 'must be {"code": …, "message": …}' });
          else validateCodeAndMessage(entry, path, parameters, problems);
        }
    }
  }
  if (problems.length === 0) {
    try {
      // json-rules-engine's own shape check, on the rule as the engine will see it (parameters bound to placeholders).
      new Rule({ conditions: stripParams(input.conditions as ConditionNode) as never, event: { type: 'finding' } });
    } catch (error) {
      problems.push({ path: 'conditions', message: `json-rules-engine refuses it: ${(error as Error).message}` });
    }
  }
  return problems;
}

/** A finding's code and message template (placeholders name facts or parameters). */
function validateCodeAndMessage(params: Record<string, unknown>, path: string, parameters: Record<string, unknown>, problems: RuleProblem[]): void {
  const { code, message } = params;
  if (typeof code !== 'string' || !/^[A-Z][A-Z0-9_]{2,63}$/.test(code))
    problems.push({ path: `${path}.code`, message: 'upper-case letters, digits and underscores, 3 to 64 characters' });
  if (typeof message !== 'string' || message.trim().length === 0 || message.length > 500) {
    problems.push({ path: `${path}.message`, message: 'text of 1 to 500 characters' });
    return;
  }
  for (const { name, filter } of messagePlaceholders(message)) {
    if (!isFactName(name) && !(has(parameters, name) && !INHERITED_NAMES.has(name)))
      problems.push({ path: `${path}.message`, message: `unknown placeholder {${name}}: name a fact or a parameter` });
    if (filter !== undefined && !(MESSAGE_FILTERS as readonly string[]).includes(filter))
      problems.push({ path: `${path}.message`, message: `unknown filter "|${filter}" in {${name}|${filter}}` });
  }
}

/** The whole rule as JSON at most 64 KiB; JSON.stringify itself refuses a structure nested past the stack. */
function sizeProblem(input: Record<string, unknown>): RuleProblem | null {
  let bytes: number;
  try {
    bytes = Buffer.byteLength(JSON.stringify(input), 'utf8');
  } catch {
    return { path: '', message: 'the rule cannot be read as JSON (nested too deeply, or not plain data)' };
  }
  if (bytes > RULE_LIMITS.maxJsonBytes) return { path: '', message: `the rule is ${bytes} bytes of JSON; at most ${RULE_LIMITS.maxJsonBytes / 1024} KiB` };
  return null;
}

function stripParams(node: ConditionNode): unknown {
  if ('all' in node) return { all: node.all.map(stripParams) };
  if ('any' in node) return { any: node.any.map(stripParams) };
  if ('not' in node) return { not: stripParams(node.not) };
  const value = node.value;
  return { ...node, value: typeof value === 'object' && value !== null && 'param' in value ? 0 : value };
}

/** Every fact a condition tree names, in order of first appearance. */
export function factsNamedBy(node: ConditionNode | null | undefined, into: string[] = []): string[] {
  if (!node) return into;
  if ('all' in node) node.all.forEach((n) => factsNamedBy(n, into));
  else if ('any' in node) node.any.forEach((n) => factsNamedBy(n, into));
  else if ('not' in node) factsNamedBy(node.not, into);
  else {
    if (!into.includes(node.fact)) into.push(node.fact);
    const value = node.value;
    if (typeof value === 'object' && value !== null && 'fact' in value && !into.includes(value.fact)) into.push(value.fact);
  }
  return into;
}
