import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { createDraft, s1pWithGamma } from '../support/parts';

interface Finding {
  ruleId: string;
  severity: string;
  code: string;
}
interface Matrix {
  rows: { radioId: number; designation: string }[];
  columns: { partId: number; reviewState: string; assignments: { radioId: number; state: string }[] }[];
  cells: { row: number; column: number; status: string; findings: Finding[] }[];
}

/** A feed loss no demo or other test radio has, so the probe rule fires on this test's product only. */
const PROBE_FEED_LOSS = 0.37;

/**
 * Two server instances (each with its own caches) against one database, as behind a load balancer:
 * every read on B is warmed first, then the write goes through A, and B must show it on the next read.
 */
describe('caches on two instances: a write on one is seen at once on the other', () => {
  let a: INestApplication;
  let b: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const on = (app: INestApplication) => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });
  const ruleId = unique('cache-probe').toLowerCase();

  let productId: number;
  let radioId: number;
  let partId: number;
  let mpn: string;

  beforeAll(async () => {
    [a, b] = await Promise.all([createApiApp(), createApiApp()]);
    tokens = await demoTokens(a);
    const ble = (await on(a).get('/api/bands').query({ designation: 'BLE 2.4 GHz' }).set(as('engineer')).expect(200)).body[0];
    const product = await on(a)
      .post('/api/products')
      .set(as('engineer'))
      .send({
        name: unique('cache probe'),
        code: unique('CP').slice(0, 40),
        owner: 'e2e',
        groundPlaneLengthMm: 62,
        groundPlaneWidthMm: 28,
        targetRegions: ['EU'],
      })
      .expect(201);
    productId = product.body.id;
    const radio = await on(a)
      .post(`/api/products/${productId}/radios`)
      .set(as('engineer'))
      .send({
        name: 'BLE',
        technology: 'ble',
        module: 'test module',
        transmitPowerDbm: 8,
        polarization: 'linear',
        connector: 'solder-pad',
        feedLossDb: PROBE_FEED_LOSS,
        bands: [{ bandId: ble.id, certifiedMaxGainDbi: 2.5 }],
      })
      .expect(201);
    radioId = radio.body.id;
    const draft = await createDraft(a, tokens.engineer);
    partId = draft.id;
    mpn = draft.mpn;
  }, 60_000);

  afterAll(async () => {
    const db = a.get(DataSource);
    await db.query('DELETE FROM compatibility_rule_versions WHERE rule_key = ?', [ruleId]);
    await db.query('DELETE FROM compatibility_rules WHERE rule_key = ?', [ruleId]);
    await Promise.all([a.close(), b.close()]);
  });

  const searchOnB = async () =>
    (await on(b).get('/api/parts').query({ q: mpn }).set(as('engineer')).expect(200)).body.items.find((p: { id: number }) => p.id === partId);
  const coversOnB = async () =>
    (await on(b).get('/api/parts').query({ q: mpn, covers: '2400-2483.5' }).set(as('engineer')).expect(200)).body.items.map((p: { id: number }) => p.id);
  const pageOnB = async () => (await on(b).get(`/api/parts/${partId}`).set(as('engineer')).expect(200)).body;
  const matrixOn = async (app: INestApplication, parts?: number[]): Promise<Matrix> =>
    (
      await on(app)
        .get(`/api/products/${productId}/matrix`)
        .query(parts ? { parts: parts.join(',') } : {})
        .set(as('engineer'))
        .expect(200)
    ).body;
  const candidatesOnB = async () =>
    (await on(b).get(`/api/products/${productId}/radios/${radioId}/candidates`).query({ limit: 200 }).set(as('engineer')).expect(200)).body;
  const warmB = () => Promise.all([searchOnB(), coversOnB(), pageOnB(), matrixOn(b, [partId]), matrixOn(b), candidatesOnB()]);

  it('part curve upload on A: search, part page and matrix on B show the measurement', async () => {
    const [summary, covering, page, matrix] = await warmB();
    expect(summary.measuredKinds).toEqual([]);
    expect(covering).not.toContain(partId);
    expect(page.measurements).toEqual([]);

    const s11 = s1pWithGamma([
      [2300, 0.1],
      [2400, 0.1],
      [2450, 0.1],
      [2500, 0.1],
      [2600, 0.1],
    ]);
    await on(a).post(`/api/parts/${partId}/measurements`).set(as('engineer')).field('kind', 's11').attach('file', Buffer.from(s11), 'probe.s1p').expect(201);

    expect((await searchOnB()).measuredKinds).toEqual(['s11']);
    expect(await coversOnB()).toContain(partId);
    const after = await pageOnB();
    expect(after.measurements.map((m: { kind: string }) => m.kind)).toEqual(['s11']);
    expect(after.coveredRanges.length).toBeGreaterThan(0);
    const fresh = await matrixOn(b, [partId]);
    expect(fresh.cells).not.toEqual(matrix.cells);
    expect(fresh.cells).toEqual((await matrixOn(a, [partId])).cells);
  });

  it('review on A: B shows the new state in search, part page and matrix, and ranks the approved part among the candidates', async () => {
    const [, , page, , , candidates] = await warmB();
    expect(candidates.candidates.map((c: { partId: number }) => c.partId)).not.toContain(partId);
    await on(a).post(`/api/parts/${partId}/submission`).set(as('engineer')).send({ version: page.version }).expect(200);
    expect((await searchOnB()).reviewState).toBe('in-review');
    expect((await pageOnB()).reviewState).toBe('in-review');

    await warmB();
    await on(a)
      .post(`/api/parts/${partId}/approval`)
      .set(as('admin'))
      .send({ version: page.version + 1 })
      .expect(200);
    expect((await searchOnB()).reviewState).toBe('approved');
    expect((await pageOnB()).reviewState).toBe('approved');
    expect((await matrixOn(b, [partId])).columns[0].reviewState).toBe('approved');
    expect((await candidatesOnB()).candidates.map((c: { partId: number }) => c.partId)).toContain(partId);
  });

  it('rule created and edited on A: the matrix and candidates on B apply it at once', async () => {
    await warmB();
    const probe = {
      id: ruleId,
      title: 'Cache probe',
      description: 'made by the cache e2e test',
      severity: 'marginal',
      enabled: true,
      version: 1,
      source: 'test',
      parameters: { loss: PROBE_FEED_LOSS },
      conditions: { all: [{ fact: 'feedLossDb', operator: 'equal', value: { param: 'loss' } }] },
      event: { type: 'finding', params: { code: 'CACHE_PROBE', message: 'probe on {designation}' } },
    };
    await on(a).post('/api/rules').set(as('admin')).send({ definition: probe }).expect(201);
    const probed = (m: Matrix) =>
      m.cells
        .flatMap((c) => c.findings)
        .filter((f) => f.ruleId === ruleId)
        .map((f) => f.severity);
    expect(probed(await matrixOn(b, [partId]))).toEqual(['marginal']);
    const candidate = (await candidatesOnB()).candidates.find((c: { partId: number }) => c.partId === partId);
    expect(candidate.bands[0].findings.map((f: Finding) => f.ruleId)).toContain(ruleId);

    await on(a)
      .put(`/api/rules/${ruleId}`)
      .set(as('admin'))
      .send({ version: 1, definition: { ...probe, severity: 'fail' } })
      .expect(200);
    expect(probed(await matrixOn(b, [partId]))).toEqual(['fail']);
    const edited = (await candidatesOnB()).candidates.find((c: { partId: number }) => c.partId === partId);
    expect(edited.status).toBe('fail');
  });

  it('radio edit on A: the matrix rows and candidates on B follow', async () => {
    const radio = (await on(a).get(`/api/products/${productId}/radios/${radioId}`).set(as('engineer')).expect(200)).body;
    await warmB();
    await on(a)
      .patch(`/api/products/${productId}/radios/${radioId}`)
      .set(as('engineer'))
      .send({ version: radio.version, name: 'BLE renamed', feedLossDb: 0.5 })
      .expect(200);
    const matrix = await matrixOn(b, [partId]);
    expect(matrix.rows.map((r) => (r as { radioName?: string }).radioName)).toEqual(['BLE renamed']);
    // The probe rule needs the old feed loss: it no longer fires.
    expect(matrix.cells.flatMap((c) => c.findings).map((f) => f.ruleId)).not.toContain(ruleId);
    const candidates = await candidatesOnB();
    expect(candidates.radioName).toBe('BLE renamed');
  });

  it('assignment on A: the matrix columns and candidates on B show it', async () => {
    expect((await matrixOn(b)).columns).toEqual([]);
    await warmB();
    await on(a).post(`/api/products/${productId}/radios/${radioId}/shortlist`).set(as('engineer')).send({ partId }).expect(201);
    const matrix = await matrixOn(b);
    expect(matrix.columns.map((c) => [c.partId, c.assignments])).toEqual([[partId, [{ radioId, state: 'shortlisted' }]]]);
    expect((await candidatesOnB()).candidates.find((c: { partId: number }) => c.partId === partId).assignment).toBe('shortlisted');

    await on(a).put(`/api/products/${productId}/radios/${radioId}/choice`).set(as('engineer')).send({ partId }).expect(200);
    expect((await matrixOn(b)).columns[0].assignments).toEqual([{ radioId, state: 'chosen' }]);
    expect((await candidatesOnB()).candidates.find((c: { partId: number }) => c.partId === partId).assignment).toBe('chosen');
  });
});
