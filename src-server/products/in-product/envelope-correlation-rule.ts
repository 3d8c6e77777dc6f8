import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { RULES_DIR, RuleFileError } from '../../compatibility/rule-files';
import { SEVERITIES, type Severity } from '../../compatibility/engine/types';

/** The correlation rule judges the product's antennas together, not a (band × part) cell: it lives in rules/system/. */
export const ENVELOPE_CORRELATION_RULE_FILE = join(RULES_DIR, 'system', 'envelope-correlation.json');
const SHOWN_NAME = 'system/envelope-correlation.json';

export interface EnvelopeCorrelationRule {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  readonly version: number;
  readonly source: string;
  readonly parameters: { readonly maxEnvelopeCorrelation: number };
  readonly severity: Severity;
}

/** Every problem of a parsed correlation rule, each with its place in the file. */
export function envelopeCorrelationRuleProblems(value: unknown): { path: string; message: string }[] {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return [{ path: '', message: 'must be an object' }];
  const rule = value as Record<string, unknown>;
  const problems: { path: string; message: string }[] = [];
  for (const key of ['id', 'title', 'description', 'source'] as const)
    if (typeof rule[key] !== 'string') problems.push({ path: key, message: 'must be a string' });
  if (!Number.isInteger(rule.version)) problems.push({ path: 'version', message: 'must be an integer' });
  const limit = (rule.parameters as Record<string, unknown> | undefined)?.maxEnvelopeCorrelation;
  if (typeof limit !== 'number' || !(limit > 0 && limit < 1))
    problems.push({ path: 'parameters.maxEnvelopeCorrelation', message: 'must be a number between 0 and 1 (exclusive)' });
  if (!(SEVERITIES as readonly unknown[]).includes(rule.severity)) problems.push({ path: 'severity', message: `must be one of ${SEVERITIES.join(', ')}` });
  return problems;
}

let cached: EnvelopeCorrelationRule | null = null;

/** The correlation rule, read once; a bad file stops with its name and the place in it. */
export function loadEnvelopeCorrelationRule(file: string = ENVELOPE_CORRELATION_RULE_FILE): EnvelopeCorrelationRule {
  if (cached && file === ENVELOPE_CORRELATION_RULE_FILE) return cached;
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    throw new RuleFileError(SHOWN_NAME, [{ path: '', message: `not readable JSON: ${(error as Error).message}` }]);
  }
  const problems = envelopeCorrelationRuleProblems(parsed);
  if (problems.length > 0) throw new RuleFileError(SHOWN_NAME, problems);
  const rule = parsed as EnvelopeCorrelationRule;
  if (file === ENVELOPE_CORRELATION_RULE_FILE) cached = rule;
  return rule;
}
