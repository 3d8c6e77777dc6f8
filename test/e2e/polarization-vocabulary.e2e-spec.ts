import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { OnePolarizationVocabulary1765500000000 } from '../../src-server/database/migrations/1765500000000-one-polarization-vocabulary';

// Demo data (catalog-seed/products.json, parts/parts.json): the tracker's GNSS radio needs RHCP; part 1019 is a linear GNSS chip.
const TRACKER_GNSS = 12;
const LINEAR_GNSS_CHIP = 1019;

/** Issue 11, one contract: rules compare polarizations in the API's spelling (linear, RHCP, LHCP). */
describe('one polarization vocabulary', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  let dataSource: DataSource;
  const as = (role: DemoRole) => ({ Authorization: `Bearer ${tokens[role]}` });
  const polarizationRule = (id: string, required: string) => ({
    id,
    title: `Test rule ${id}`,
    description: 'made by the e2e tests',
    severity: 'fail',
    enabled: false,
    version: 1,
    source: 'test',
    parameters: {},
    conditions: {
      all: [
        { fact: 'requiredPolarization', operator: 'equal', value: required },
        { fact: 'partPolarization', operator: 'equal', value: 'linear' },
      ],
    },
    event: { type: 'finding', params: { code: 'TEST_POLARIZATION', message: 'a {partPolarization} part for a {requiredPolarization} radio' } },
  });
  const asJson = (stored: unknown) => (typeof stored === 'string' ? JSON.parse(stored) : stored) as ReturnType<typeof polarizationRule>;

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    dataSource = app.get<DataSource>(getDataSourceToken());
  });
  afterAll(() => app.close());

  it('gives rules the polarization facts as the API spells them', async () => {
    const id = unique('e2e-polarization').toLowerCase();
    const res = await request(app.getHttpServer())
      .post('/api/rules/preview')
      .set(as('admin'))
      .send({ definition: { ...polarizationRule(id, 'RHCP'), enabled: true } })
      .expect(200);
    expect(res.body.changes).toContainEqual(
      expect.objectContaining({ radioId: TRACKER_GNSS, partId: LINEAR_GNSS_CHIP, after: 'fail', findings: ['a linear part for a RHCP radio'] }),
    );
  });

  it('migration 1765500000000 rewrites a stored rule and its history that compare with rhcp, and down restores them', async () => {
    const ruleKey = unique('e2e-lower-polarization').toLowerCase();
    const lower = polarizationRule(ruleKey, 'rhcp');
    const migration = new OnePolarizationVocabulary1765500000000();
    const runner = dataSource.createQueryRunner();
    const storedRule = async () => asJson((await runner.query('SELECT definition FROM compatibility_rules WHERE rule_key = ?', [ruleKey]))[0].definition);
    const storedVersion = async () =>
      asJson((await runner.query('SELECT definition FROM compatibility_rule_versions WHERE rule_key = ?', [ruleKey]))[0].definition);
    try {
      // Disabled, so no other test's matrix sees it.
      await runner.query('INSERT INTO compatibility_rules (rule_key, origin, definition, version, enabled) VALUES (?, ?, ?, 1, 0)', [
        ruleKey,
        'admin',
        JSON.stringify(lower),
      ]);
      await runner.query('INSERT INTO compatibility_rule_versions (rule_key, version, action, definition) VALUES (?, 1, ?, ?)', [
        ruleKey,
        'created',
        JSON.stringify(lower),
      ]);
      await migration.up(runner);
      expect((await storedRule()).conditions.all[0]).toEqual({ fact: 'requiredPolarization', operator: 'equal', value: 'RHCP' });
      expect((await storedVersion()).conditions.all[0].value).toBe('RHCP');
      expect((await storedRule()).conditions.all[1].value).toBe('linear');
      const served = await request(app.getHttpServer()).get(`/api/rules/${ruleKey}`).set(as('admin')).expect(200);
      expect(served.body.definition.conditions.all[0].value).toBe('RHCP');

      await migration.down(runner);
      expect((await storedRule()).conditions.all[0].value).toBe('rhcp');
      await migration.up(runner);
      expect((await storedRule()).conditions.all[0].value).toBe('RHCP');
    } finally {
      await runner.query('DELETE FROM compatibility_rules WHERE rule_key = ?', [ruleKey]);
      await runner.release();
    }
  });
});
