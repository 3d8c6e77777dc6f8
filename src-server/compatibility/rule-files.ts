import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { type RuleDefinition, validateRuleDefinition } from './engine/rule-definition';

/** Relative to the working directory, like catalog-seed/: the server and the tests run from the project root. */
export const RULES_DIR = resolve('rules');

export class RuleFileError extends Error {
  constructor(
    readonly file: string,
    readonly problems: { path: string; message: string }[],
  ) {
    super(`${file}: ${problems.map((p) => (p.path ? `${p.path}: ${p.message}` : p.message)).join('; ')}`);
    this.name = 'RuleFileError';
  }
}

/** The file-based rules, sorted by id; a bad file stops the load, naming the file and the place in it. */
export function loadRuleFiles(directory: string = RULES_DIR): RuleDefinition[] {
  const rules: RuleDefinition[] = [];
  for (const name of readdirSync(directory)
    .filter((n) => n.endsWith('.json'))
    .sort()) {
    const file = join(directory, name);
    let parsed: unknown;
    try {
      parsed = JSON.parse(readFileSync(file, 'utf8'));
    } catch (error) {
      throw new RuleFileError(name, [{ path: '', message: `not valid JSON: ${(error as Error).message}` }]);
    }
    const problems = validateRuleDefinition(parsed);
    if (problems.length > 0) throw new RuleFileError(name, problems);
    const rule = parsed as RuleDefinition;
    if (`${rule.id}.json` !== name) throw new RuleFileError(name, [{ path: 'id', message: `the file of rule "${rule.id}" must be named ${rule.id}.json` }]);
    rules.push(rule);
  }
  return rules;
}
