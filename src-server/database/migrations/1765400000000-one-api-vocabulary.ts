import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Rule facts renamed to the API's one spelling of the MHz suffix (issue 11). */
export const RENAMED_FACTS = [
  ['bandLowestMHz', 'bandLowestMhz'],
  ['bandHighestMHz', 'bandHighestMhz'],
  ['worstVswrAtMHz', 'worstVswrAtMhz'],
  ['minRadiationEfficiencyAtMHz', 'minRadiationEfficiencyAtMhz'],
  ['minTotalEfficiencyAtMHz', 'minTotalEfficiencyAtMhz'],
  ['peakGainAtMHz', 'peakGainAtMhz'],
] as const;

const OLD_RADIO_CONNECTORS = "'solder-pad','sma','rp-sma','mmcx','mcx','n','micro-coax'";
const NEW_RADIO_CONNECTORS = "'solder-pad','SMA','RP-SMA','MMCX','MCX','N','micro-coax'";

/** REPLACE over the stored JSON text: fact names appear in conditions and in message templates alike. */
function renameFactsSql(table: string, direction: 'up' | 'down'): string {
  let expression = 'definition';
  for (const [oldName, newName] of RENAMED_FACTS) {
    const [from, to] = direction === 'up' ? [oldName, newName] : [newName, oldName];
    expression = `REPLACE(${expression}, '${from}', '${to}')`;
  }
  return `UPDATE ${table} SET definition = ${expression}`;
}

/**
 * Issue 11, one contract: radios name their connectors as parts do (SMA, RP-SMA, N …), and stored rules
 * name the facts with the API's one spelling of the MHz suffix.
 */
export class OneApiVocabulary1765400000000 implements MigrationInterface {
  name = 'OneApiVocabulary1765400000000';

  async up(q: QueryRunner): Promise<void> {
    await this.convertRadioConnectors(q, NEW_RADIO_CONNECTORS, (c) => `UPPER(${c})`);
    for (const table of ['compatibility_rules', 'compatibility_rule_versions']) await q.query(renameFactsSql(table, 'up'));
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['compatibility_rules', 'compatibility_rule_versions']) await q.query(renameFactsSql(table, 'down'));
    await this.convertRadioConnectors(q, OLD_RADIO_CONNECTORS, (c) => `LOWER(${c})`);
  }

  /** Through VARCHAR: an ENUM compares case-insensitively, so 'sma' and 'SMA' cannot stand in one definition. */
  private async convertRadioConnectors(q: QueryRunner, values: string, recase: (column: string) => string): Promise<void> {
    await q.query('ALTER TABLE radios MODIFY connector VARCHAR(20) NOT NULL');
    await q.query(`UPDATE radios SET connector = ${recase('connector')} WHERE connector NOT IN ('solder-pad', 'micro-coax')`);
    await q.query(`ALTER TABLE radios MODIFY connector ENUM(${values}) NOT NULL`);
  }
}
