import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { OneApiVocabulary1765400000000 } from '../../src-server/database/migrations/1765400000000-one-api-vocabulary';

/** Issue 11, one contract: one spelling of each unit suffix and one vocabulary of each enumeration across the API. */
describe('one API vocabulary', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  let dataSource: DataSource;
  const as = (role: DemoRole) => ({ Authorization: `Bearer ${tokens[role]}` });
  const radio = (connector: string) => ({
    name: 'Cellular',
    technology: 'lte',
    module: 'Test modem (invented)',
    transmitPowerDbm: 23,
    polarization: 'linear',
    connector,
    feedLossDb: 0.5,
    bands: [{ bandId: 103 }],
  });
  const createProduct = async () =>
    (
      await request(app.getHttpServer())
        .post('/api/products')
        .set(as('engineer'))
        .send({
          name: unique('Vocabulary product'),
          code: unique('VOC').slice(0, 40),
          owner: 'Test Owner',
          groundPlaneLengthMm: 80,
          groundPlaneWidthMm: 40,
          targetRegions: ['EU'],
        })
        .expect(201)
    ).body as { id: number };

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    dataSource = app.get<DataSource>(getDataSourceToken());
  });
  afterAll(() => app.close());

  it('names radio connectors as parts do (SMA, RP-SMA, N) and refuses the old lower-case spelling', async () => {
    const product = await createProduct();
    const created = await request(app.getHttpServer()).post(`/api/products/${product.id}/radios`).set(as('engineer')).send(radio('RP-SMA')).expect(201);
    expect(created.body.connector).toBe('RP-SMA');
    const refused = await request(app.getHttpServer()).post(`/api/products/${product.id}/radios`).set(as('engineer')).send(radio('rp-sma')).expect(400);
    expect(refused.body).toMatchObject({ code: 'VALIDATION_FAILED', fields: [{ field: 'connector' }] });
  });

  it('spells the MHz suffix one way in bands, limits and parts', async () => {
    const band = (await request(app.getHttpServer()).get('/api/bands/103').set(as('engineer')).expect(200)).body;
    expect(Object.keys(band.ranges[0])).toEqual(expect.arrayContaining(['fromMhz', 'toMhz']));
    const limits = (await request(app.getHttpServer()).get('/api/regulatory-limits').set(as('engineer')).expect(200)).body;
    expect(Object.keys(limits[0])).toEqual(expect.arrayContaining(['fromMhz', 'toMhz']));
    const text = JSON.stringify([band, limits]);
    expect(text).not.toMatch(/[a-z]MHz"/);
  });

  it('the migration converts stored connectors and fact names down and up again', async () => {
    const product = await createProduct();
    const created = (await request(app.getHttpServer()).post(`/api/products/${product.id}/radios`).set(as('engineer')).send(radio('SMA')).expect(201)).body as {
      id: number;
    };
    const ruleKey = unique('vocabulary-rule').toLowerCase();
    const migration = new OneApiVocabulary1765400000000();
    const runner = dataSource.createQueryRunner();
    try {
      await migration.down(runner);
      expect((await runner.query('SELECT connector FROM radios WHERE id = ?', [created.id]))[0].connector).toBe('sma');
      // A disabled admin rule as the old spelling stored it, so no other test's matrix sees it.
      const definition = {
        id: ruleKey,
        conditions: { all: [{ fact: 'bandLowestMHz', operator: 'lessThan', value: 700 }] },
        event: { type: 'finding', params: { message: 'worst at {worstVswrAtMHz} MHz' } },
      };
      await runner.query('INSERT INTO compatibility_rules (rule_key, origin, definition, version, enabled) VALUES (?, ?, ?, 1, 0)', [
        ruleKey,
        'admin',
        JSON.stringify(definition),
      ]);
      await migration.up(runner);
      expect((await runner.query('SELECT connector FROM radios WHERE id = ?', [created.id]))[0].connector).toBe('SMA');
      const stored = (await runner.query('SELECT definition FROM compatibility_rules WHERE rule_key = ?', [ruleKey]))[0].definition as unknown;
      // mysql2 hands a JSON column back parsed or as text, depending on the server's column type.
      const migrated = typeof stored === 'string' ? JSON.parse(stored) : stored;
      expect(migrated.conditions.all[0].fact).toBe('bandLowestMhz');
      expect(migrated.event.params.message).toBe('worst at {worstVswrAtMhz} MHz');
    } finally {
      await runner.query('DELETE FROM compatibility_rules WHERE rule_key = ?', [ruleKey]);
      await runner.release();
    }
  });
});
