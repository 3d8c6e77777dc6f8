import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TECHNOLOGIES } from './engine/types';
import { SEVERITIES } from './engine/types';
import type { CoexistenceRule } from './engine/coexistence-check';
import { RULES_DIR, RuleFileError } from './rule-files';

/** The coexistence rule lives beside the cell rules, in its own folder: it judges the product, not a (band × part) cell. */
export const COEXISTENCE_RULE_FILE = join(RULES_DIR, 'coexistence', 'coexistence.json');

const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Every problem of a parsed coexistence rule, each with its place in the file. */
export function coexistenceRuleProblems(value: unknown): { path: string; message: string }[] {
  const problems: { path: string; message: string }[] = [];
  const need = (ok: boolean, path: string, message: string) => {
    if (!ok) problems.push({ path, message });
  };
  if (!isObject(value)) return [{ path: '', message: 'must be an object' }];
  for (const key of ['id', 'title', 'description', 'source'] as const) need(typeof value[key] === 'string', key, 'must be a string');
  need(Number.isInteger(value.version), 'version', 'must be an integer');
  const p = value.parameters;
  if (!isObject(p)) return [...problems, { path: 'parameters', message: 'must be an object' }];
  need(isNumber(p.guardMhz) && p.guardMhz >= 0 && p.guardMhz <= 1000, 'parameters.guardMhz', 'must be a number of MHz from 0 to 1000');
  need(
    Number.isInteger(p.maxHarmonicOrder) && (p.maxHarmonicOrder as number) >= 1 && (p.maxHarmonicOrder as number) <= 10,
    'parameters.maxHarmonicOrder',
    'must be an integer from 1 to 10',
  );
  need(
    Array.isArray(p.intermodulationOrders) && p.intermodulationOrders.every((o) => o === 3 || o === 5),
    'parameters.intermodulationOrders',
    'must be a list of 3 and/or 5',
  );
  need(isNumber(p.thermalNoiseDbmPerHz), 'parameters.thermalNoiseDbmPerHz', 'must be a number (dBm/Hz)');
  need(isNumber(p.interferenceToNoiseDb), 'parameters.interferenceToNoiseDb', 'must be a number (dB)');
  const emission = value.emissionDbc;
  const harmonicOrders = Array.from({ length: Math.max(0, Number(p.maxHarmonicOrder) - 1) }, (_, i) => String(i + 2));
  const ordersOf = {
    harmonic: harmonicOrders,
    intermodulation: Array.isArray(p.intermodulationOrders) ? p.intermodulationOrders.map(String) : [],
    adjacent: ['1'],
  };
  for (const [mechanism, orders] of Object.entries(ordersOf)) {
    const levels = isObject(emission) ? emission[mechanism] : undefined;
    for (const order of orders)
      need(isObject(levels) && isNumber(levels[order]) && levels[order] <= 0, `emissionDbc.${mechanism}.${order}`, 'must be a level ≤ 0 dBc');
  }
  for (const technology of TECHNOLOGIES) {
    const victim = isObject(value.victims) ? value.victims[technology] : undefined;
    need(
      isObject(victim) && isNumber(victim.bandwidthMhz) && victim.bandwidthMhz > 0,
      `victims.${technology}.bandwidthMhz`,
      'must be a positive number of MHz',
    );
    need(isObject(victim) && isNumber(victim.noiseFigureDb) && victim.noiseFigureDb >= 0, `victims.${technology}.noiseFigureDb`, 'must be a number of dB ≥ 0');
  }
  for (const key of ['overlapIsolationUnknown', 'nearIsolationUnknown', 'isolationShort', 'isolationMet']) {
    const severity = isObject(value.severities) ? value.severities[key] : undefined;
    need((SEVERITIES as readonly unknown[]).includes(severity), `severities.${key}`, `must be one of ${SEVERITIES.join(', ')}`);
  }
  return problems;
}

let cached: CoexistenceRule | null = null;

/** The coexistence rule, read once; a bad file stops with its name and the place in it. */
export function loadCoexistenceRule(file: string = COEXISTENCE_RULE_FILE): CoexistenceRule {
  if (cached && file === COEXISTENCE_RULE_FILE) return cached;
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    throw new RuleFileError('coexistence/coexistence.json', [{ path: '', message: `not readable JSON: ${(error as Error).message}` }]);
  }
  const problems = coexistenceRuleProblems(parsed);
  if (problems.length > 0) throw new RuleFileError('coexistence/coexistence.json', problems);
  const rule = parsed as CoexistenceRule;
  if (file === COEXISTENCE_RULE_FILE) cached = rule;
  return rule;
}
