import type { MigrationInterface, QueryRunner } from 'typeorm';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
type Direction = 'up' | 'down';

/** The facts whose values are polarizations; their spelling is the API's (linear, RHCP, LHCP) from now on. */
const POLARIZATION_FACTS: ReadonlySet<string> = new Set(['requiredPolarization', 'partPolarization']);
const SPELLINGS: Record<Direction, Readonly<Record<string, string>>> = { up: { rhcp: 'RHCP', lhcp: 'LHCP' }, down: { RHCP: 'rhcp', LHCP: 'lhcp' } };
/** Each table that holds rule JSON, with its row key. */
const RULE_TABLES = [
  ['compatibility_rules', 'rule_key'],
  ['compatibility_rule_versions', 'id'],
] as const;

const isObject = (value: Json | undefined): value is { [key: string]: Json } => typeof value === 'object' && value !== null && !Array.isArray(value);

function respellWord(word: Json, direction: Direction): Json {
  return typeof word === 'string' && Object.hasOwn(SPELLINGS[direction], word) ? SPELLINGS[direction][word] : word;
}

/** A literal, a list of them, or a parameter table (whose keys are polarizations when it is looked up by one). */
function respellValue(value: Json, direction: Direction, keysToo: boolean): Json {
  if (Array.isArray(value)) return value.map((v) => respellWord(v, direction));
  if (isObject(value))
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [keysToo ? (respellWord(k, direction) as string) : k, respellWord(v, direction)]));
  return respellWord(value, direction);
}

/**
 * The rule with every value it compares with a polarization fact spelled for direction: literal values in
 * conditions and appliesWhen, and the parameters such conditions name. Null when nothing changes.
 */
export function respellPolarizations(definition: Json, direction: Direction): Json | null {
  if (!isObject(definition)) return null;
  const parameters = new Set<string>();
  const tables = new Set<string>();
  const walk = (node: Json): Json => {
    if (!isObject(node)) return node;
    for (const group of ['all', 'any']) if (Array.isArray(node[group])) return { ...node, [group]: (node[group] as Json[]).map(walk) };
    if (Object.hasOwn(node, 'not')) return { ...node, not: walk(node.not) };
    const value = node.value;
    if (isObject(value)) {
      if (typeof value.param === 'string') {
        if (typeof node.fact === 'string' && POLARIZATION_FACTS.has(node.fact)) parameters.add(value.param);
        if (typeof value.key === 'string' && POLARIZATION_FACTS.has(value.key)) tables.add(value.param);
      }
      return node;
    }
    return typeof node.fact === 'string' && POLARIZATION_FACTS.has(node.fact) && value !== undefined
      ? { ...node, value: respellValue(value, direction, false) }
      : node;
  };
  const next: { [key: string]: Json } = { ...definition };
  for (const part of ['appliesWhen', 'conditions']) if (definition[part] !== undefined) next[part] = walk(definition[part]);
  if (isObject(definition.parameters)) {
    const stored = definition.parameters;
    next.parameters = Object.fromEntries(
      Object.entries(stored).map(([name, value]) => [
        name,
        parameters.has(name) || tables.has(name) ? respellValue(value, direction, tables.has(name)) : value,
      ]),
    );
  }
  return JSON.stringify(next) === JSON.stringify(definition) ? null : next;
}

/**
 * Issue 11, one contract: rule facts spell polarizations as the API and the database do (linear, RHCP,
 * LHCP), so stored rules, admin-made or edited, that compare a polarization fact with 'rhcp' or 'lhcp' are rewritten.
 */
export class OnePolarizationVocabulary1765500000000 implements MigrationInterface {
  name = 'OnePolarizationVocabulary1765500000000';

  async up(q: QueryRunner): Promise<void> {
    await this.respellStoredRules(q, 'up');
  }

  async down(q: QueryRunner): Promise<void> {
    await this.respellStoredRules(q, 'down');
  }

  private async respellStoredRules(q: QueryRunner, direction: Direction): Promise<void> {
    for (const [table, key] of RULE_TABLES) {
      // Both polarization facts end in "Polarization"; other rules are left alone without being parsed.
      const rows: { row_key: string | number; definition: Json }[] = await q.query(
        `SELECT ${key} AS row_key, definition FROM ${table} WHERE definition LIKE '%Polarization%'`,
      );
      for (const row of rows) {
        // mysql2 hands a JSON column back parsed or as text, depending on the server's column type.
        const definition = typeof row.definition === 'string' ? (JSON.parse(row.definition) as Json) : row.definition;
        const respelled = respellPolarizations(definition, direction);
        if (respelled !== null) await q.query(`UPDATE ${table} SET definition = ? WHERE ${key} = ?`, [JSON.stringify(respelled), row.row_key]);
      }
    }
  }
}
