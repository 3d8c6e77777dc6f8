import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Codes earlier versions stored → what they are now: `AS` meant Asia but is American Samoa in ISO 3166-1; `UK` is `GB` there. */
export const REGION_RENAMES: readonly (readonly [string, string])[] = [
  ['AS', 'ASIA'],
  ['UK', 'GB'],
];

/** Every limit on file before this migration governs licence-exempt devices (47 CFR 15.247, ETSI EN 300 328 / 300 220-2 / 301 893). */
const LICENCE_EXEMPT = ['wifi', 'ble', 'ism', 'other'];

/** The service the seed meant for each seeded limit (id, title), more precisely than LICENCE_EXEMPT. */
const SEEDED_LIMIT_TECHNOLOGIES: readonly (readonly [number, string, readonly string[]])[] = [
  [1, 'FCC DTS 902–928 MHz', ['ism', 'other']],
  [2, 'FCC DTS 2400–2483.5 MHz', ['wifi', 'ble', 'ism', 'other']],
  [3, 'FCC DTS 5725–5850 MHz', ['wifi', 'ism', 'other']],
  [4, 'ETSI 2.4 GHz wideband data', ['wifi', 'ble', 'ism', 'other']],
  [5, 'SRD 863–865 MHz', ['ism', 'other']],
  [6, 'SRD 865–868 MHz', ['ism', 'other']],
  [7, 'SRD 868.0–868.6 MHz', ['ism', 'other']],
  [8, 'SRD 868.7–869.2 MHz', ['ism', 'other']],
  [9, 'SRD 869.4–869.65 MHz', ['ism', 'other']],
  [10, 'SRD 869.7–870.0 MHz', ['ism', 'other']],
  [11, 'RLAN 5150–5250 MHz', ['wifi']],
  [12, 'RLAN 5250–5350 MHz', ['wifi']],
  [13, 'RLAN 5470–5725 MHz', ['wifi']],
];

/** Main lobe of each library GNSS signal's open-service signal (MHz), as in catalog-seed/bands.json (sources there). */
const GNSS_MAIN_LOBES: readonly (readonly [string, number, number])[] = [
  ['GPS L1', 1574.397, 1576.443],
  ['GPS L2C', 1226.577, 1228.623],
  ['GPS L5', 1166.22, 1186.68],
  ['Galileo E1', 1573.374, 1577.466],
  ['Galileo E5a', 1166.22, 1186.68],
  ['Galileo E5b', 1196.91, 1217.37],
  ['Galileo E6', 1273.635, 1283.865],
  ['BeiDou B1I', 1559.052, 1563.144],
  ['BeiDou B1C', 1573.374, 1577.466],
  ['BeiDou B2a', 1166.22, 1186.68],
  ['GLONASS G1', 1597.5515, 1605.886],
  ['GLONASS G2', 1242.4265, 1249.136],
];

/** Indicative markets of library bands that had none, so the market check can read them (catalog-seed/bands.json says the same). */
const BAND_MARKETS: readonly (readonly [string, readonly string[]])[] = [
  ['B1', ['EU', 'GB', 'ASIA', 'AU', 'NZ']],
  ['B2', ['US', 'CA', 'MX']],
  ['B3', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR']],
  ['B4', ['US', 'CA', 'MX']],
  ['B5', ['US', 'CA', 'MX', 'BR', 'AU', 'ASIA']],
  ['B7', ['EU', 'GB', 'BR', 'CA', 'AU', 'ASIA']],
  ['B8', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR']],
  ['B28', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR', 'MX']],
  ['n1', ['EU', 'GB', 'ASIA', 'AU', 'NZ']],
  ['n3', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR']],
  ['n5', ['US', 'CA', 'MX', 'BR', 'AU', 'ASIA']],
  ['n7', ['EU', 'GB', 'BR', 'CA', 'AU', 'ASIA']],
  ['n8', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR']],
  ['n28', ['EU', 'GB', 'ASIA', 'AU', 'NZ', 'BR', 'MX']],
  ['n66', ['US', 'CA', 'MX']],
  ['n71', ['US', 'CA']],
  ['n41', ['US', 'CN', 'JP']],
  ['n77', ['US', 'CA', 'JP']],
  ['n78', ['EU', 'GB', 'ASIA', 'AU']],
  ['n79', ['JP', 'CN']],
];

export function renameRegions(regions: readonly string[], direction: 'up' | 'down'): string[] {
  const map = new Map(direction === 'up' ? REGION_RENAMES : REGION_RENAMES.map(([a, b]) => [b, a] as const));
  return [...new Set(regions.map((r) => map.get(r) ?? r))];
}

const parseList = (value: unknown): string[] => (typeof value === 'string' ? JSON.parse(value) : (value as string[]));

/**
 * Issue 12, figures that mean what they say: regulatory limits name the technologies (services) they govern and
 * may count conducted power; regions are ISO 3166-1 codes or named groupings (AS → ASIA, UK → GB in bands, limits
 * and products' markets); a radio band may list the channels the radio uses; GNSS signals carry their main lobe and
 * a GNSS radio says which bandwidth it needs.
 */
export class LimitsByServiceAndMarkets1765520000000 implements MigrationInterface {
  name = 'LimitsByServiceAndMarkets1765520000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE regulatory_limits ADD technologies JSON NULL AFTER region');
    await q.query('UPDATE regulatory_limits SET technologies = ?', [JSON.stringify(LICENCE_EXEMPT)]);
    for (const [id, title, technologies] of SEEDED_LIMIT_TECHNOLOGIES) {
      await q.query('UPDATE regulatory_limits SET technologies = ? WHERE id = ? AND title = ?', [JSON.stringify(technologies), id, title]);
    }
    await q.query('ALTER TABLE regulatory_limits MODIFY technologies JSON NOT NULL');
    await q.query("ALTER TABLE regulatory_limits MODIFY kind ENUM('eirp','erp','conducted','conducted-gain-rule') NOT NULL");

    await this.renameStoredRegions(q, 'up');

    await q.query('ALTER TABLE bands ADD main_lobe_from_mhz DOUBLE NULL AFTER bandwidth_mhz, ADD main_lobe_to_mhz DOUBLE NULL AFTER main_lobe_from_mhz');
    for (const [designation, from, to] of GNSS_MAIN_LOBES) {
      await q.query("UPDATE bands SET main_lobe_from_mhz = ?, main_lobe_to_mhz = ? WHERE designation = ? AND technology = 'gnss'", [from, to, designation]);
    }
    for (const [designation, regions] of BAND_MARKETS) {
      await q.query('UPDATE bands SET regions = ? WHERE designation = ? AND JSON_LENGTH(regions) = 0', [JSON.stringify(regions), designation]);
    }

    await q.query('ALTER TABLE radio_bands ADD channels JSON NULL');
    await q.query("ALTER TABLE radios ADD gnss_bandwidth ENUM('main-lobe','full-band') NULL AFTER feed_loss_db");
    await q.query("UPDATE radios SET gnss_bandwidth = 'main-lobe' WHERE technology = 'gnss'");
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE radios DROP COLUMN gnss_bandwidth');
    await q.query('ALTER TABLE radio_bands DROP COLUMN channels');
    await q.query('ALTER TABLE bands DROP COLUMN main_lobe_to_mhz, DROP COLUMN main_lobe_from_mhz');
    await this.renameStoredRegions(q, 'down');
    // Before this migration every limit governed every technology and none counted conducted power alone: such limits cannot be kept.
    const rows: { id: number; technologies: unknown }[] = await q.query("SELECT id, technologies FROM regulatory_limits WHERE kind <> 'conducted'");
    const licensedOnly = rows.filter((r) => !parseList(r.technologies).some((t) => LICENCE_EXEMPT.includes(t))).map((r) => r.id);
    await q.query("DELETE FROM regulatory_limits WHERE kind = 'conducted'");
    if (licensedOnly.length > 0) await q.query('DELETE FROM regulatory_limits WHERE id IN (?)', [licensedOnly]);
    await q.query("ALTER TABLE regulatory_limits MODIFY kind ENUM('eirp','erp','conducted-gain-rule') NOT NULL");
    await q.query('ALTER TABLE regulatory_limits DROP COLUMN technologies');
  }

  /** Bands' regions, products' markets (deleted products too) and limits' regions, rewritten in one pass each. */
  private async renameStoredRegions(q: QueryRunner, direction: 'up' | 'down'): Promise<void> {
    for (const [table, column] of [
      ['bands', 'regions'],
      ['products', 'target_regions'],
    ] as const) {
      const rows: { id: number; list: unknown }[] = await q.query(`SELECT id, ${column} AS list FROM ${table}`);
      for (const row of rows) {
        const before = parseList(row.list);
        const after = renameRegions(before, direction);
        if (JSON.stringify(after) !== JSON.stringify(before)) await q.query(`UPDATE ${table} SET ${column} = ? WHERE id = ?`, [JSON.stringify(after), row.id]);
      }
    }
    for (const [from, to] of direction === 'up' ? REGION_RENAMES : REGION_RENAMES.map(([a, b]) => [b, a])) {
      await q.query('UPDATE regulatory_limits SET region = ? WHERE region = ?', [to, from]);
    }
  }
}
