import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { createDraft } from '../support/parts';
import { testClientAddress } from '../support/client-address';

// Sign-ins of this file come from an address of their own: the per-address allowance is shared through the database.
const clientAddress = testClientAddress();

// Demo parts (catalog-seed) that any radio may shortlist.
const DEMO_PARTS = [1025, 1029, 1019];

describe('bad input answers 4xx with a code and the field, never 5xx (API)', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  const http = () => request(app.getHttpServer());
  const as = (role: DemoRole) => ({ Authorization: `Bearer ${tokens[role]}` });
  const fieldsOf = (res: request.Response) => [...new Set(((res.body.fields ?? []) as { field: string }[]).map((f) => f.field))];

  const productBody = () => ({
    name: unique('Bad-input product'),
    code: unique('BI').slice(0, 40),
    owner: 'Test Owner',
    groundPlaneLengthMm: 80,
    groundPlaneWidthMm: 40,
    targetRegions: ['EU'],
  });
  const radioBody = () => ({
    name: 'Cellular',
    technology: 'lte',
    module: 'Test modem (invented)',
    transmitPowerDbm: 23,
    polarization: 'linear',
    connector: 'solder-pad',
    feedLossDb: 0.5,
    bands: [{ bandId: 103, certifiedMaxGainDbi: 5 }],
  });
  const bandBody = () => ({
    technology: 'ism',
    designation: unique('BI').slice(0, 40),
    name: 'Bad-input test band',
    duplex: 'half-duplex',
    ranges: [{ role: 'transmit-receive', fromMhz: 433.05, toMhz: 434.79 }],
    regions: ['EU'],
    sourceDocument: 'test',
    sourceTable: 'test',
  });
  const limitBody = () => ({
    region: 'EU',
    title: unique('Bad-input limit'),
    fromMhz: 433.05,
    toMhz: 434.79,
    kind: 'erp',
    valueDbm: 10,
    valueText: '10 mW e.r.p.',
    source: 'test',
  });
  const bandSetBody = () => ({ name: unique('Bad-input set'), description: 'test list, invented', bandIds: [103] });
  const createProduct = async () =>
    (await http().post('/api/products').set(as('engineer')).send(productBody()).expect(201)).body as { id: number; version: number };

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  describe('JSON bodies', () => {
    it('refuses nesting deeper than 64 levels with 400 JSON_TOO_DEEP, even from an anonymous caller and at 40,000 levels', async () => {
      for (const depth of [65, 40_000]) {
        const body = `${'['.repeat(depth)}${']'.repeat(depth)}`;
        const res = await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).set('Content-Type', 'application/json').send(body);
        expect([res.status, res.body.code]).toEqual([400, 'JSON_TOO_DEEP']);
      }
      const nested = `{"email":"a@b.test","password":"x","extra":${'{"a":'.repeat(200)}1${'}'.repeat(200)}}`;
      const res = await http().post('/api/products').set(as('engineer')).set('Content-Type', 'application/json').send(nested);
      expect([res.status, res.body.code]).toEqual([400, 'JSON_TOO_DEEP']);
    });

    it('refuses a lone UTF-16 surrogate escape with 400 JSON_BAD_UNICODE and stores a proper pair', async () => {
      for (const escape of ['\\ud800', '\\udfff', '\\ud83dx']) {
        const body = JSON.stringify(productBody()).replace('"owner":"Test Owner"', `"owner":"Test ${escape} Owner"`);
        const res = await http().post('/api/products').set(as('engineer')).set('Content-Type', 'application/json').send(body);
        expect([res.status, res.body.code]).toEqual([400, 'JSON_BAD_UNICODE']);
      }
      const pair = JSON.stringify(productBody()).replace('"owner":"Test Owner"', '"owner":"Test \\ud83d\\udce1 Owner"');
      const created = await http().post('/api/products').set(as('engineer')).set('Content-Type', 'application/json').send(pair).expect(201);
      expect(created.body.owner).toBe('Test \u{1F4E1} Owner');
    });
  });

  describe('null for a required field in a PATCH', () => {
    const expectNullRefused = async (path: string, role: DemoRole, fields: string[], extra: Record<string, unknown> = {}) => {
      for (const field of fields) {
        const res = await http()
          .patch(path)
          .set(as(role))
          .send({ ...extra, [field]: null });
        expect([field, res.status, res.body.code]).toEqual([field, 400, 'VALIDATION_FAILED']);
        expect(fieldsOf(res)).toEqual([field]);
      }
    };

    it('bands, regulatory limits and band sets', async () => {
      const band = (await http().post('/api/bands').set(as('admin')).send(bandBody()).expect(201)).body;
      await expectNullRefused(`/api/bands/${band.id}`, 'admin', [
        'technology',
        'designation',
        'name',
        'duplex',
        'ranges',
        'regions',
        'sourceDocument',
        'sourceTable',
      ]);
      await http().patch(`/api/bands/${band.id}`).set(as('admin')).send({ sourceNote: null, centreMhz: null }).expect(200);

      const limit = (await http().post('/api/regulatory-limits').set(as('admin')).send(limitBody()).expect(201)).body;
      await expectNullRefused(`/api/regulatory-limits/${limit.id}`, 'admin', [
        'region',
        'title',
        'fromMhz',
        'toMhz',
        'kind',
        'valueDbm',
        'valueText',
        'source',
      ]);
      await http().patch(`/api/regulatory-limits/${limit.id}`).set(as('admin')).send({ note: null }).expect(200);

      const set = (await http().post('/api/band-sets').set(as('admin')).send(bandSetBody()).expect(201)).body;
      await expectNullRefused(`/api/band-sets/${set.id}`, 'admin', ['name', 'description', 'bandIds'], set.version ? { version: set.version } : {});
    });

    it('products and radios (nullable notes may still be cleared)', async () => {
      const product = await createProduct();
      await expectNullRefused(
        `/api/products/${product.id}`,
        'engineer',
        ['name', 'code', 'owner', 'groundPlaneLengthMm', 'groundPlaneWidthMm', 'targetRegions'],
        { version: product.version },
      );
      const nullVersion = await http().patch(`/api/products/${product.id}`).set(as('engineer')).send({ version: null, name: 'x' }).expect(400);
      expect(fieldsOf(nullVersion)).toEqual(['version']);
      await http().patch(`/api/products/${product.id}`).set(as('engineer')).send({ version: product.version, notes: null }).expect(200);

      const radio = (await http().post(`/api/products/${product.id}/radios`).set(as('engineer')).send(radioBody()).expect(201)).body;
      await expectNullRefused(
        `/api/products/${product.id}/radios/${radio.id}`,
        'engineer',
        ['name', 'technology', 'module', 'polarization', 'connector', 'feedLossDb', 'bands'],
        { version: radio.version },
      );
    });

    it('parts', async () => {
      const part = await createDraft(app, tokens.engineer);
      await expectNullRefused(
        `/api/parts/${part.id}`,
        'engineer',
        ['manufacturer', 'mpn', 'title', 'formFactor', 'connector', 'polarization', 'lifecycle', 'nominalImpedanceOhms', 'specBands'],
        { version: part.version },
      );
      await http().patch(`/api/parts/${part.id}`).set(as('engineer')).send({ version: part.version, notes: null, lengthMm: null }).expect(200);
    });

    it('nested optional objects of the calculators (found by the fuzz test: null reached the service)', async () => {
      const conversion = await http().post('/api/rf/conversions').set(as('procurement')).send({ impedanceOhms: null }).expect(400);
      expect(conversion.body.fields).toEqual(expect.arrayContaining([expect.objectContaining({ field: 'impedanceOhms' })]));
      const matching = { frequencyHz: 500e6, loadOhms: { re: 200, im: -100 }, z0Ohms: 100, series: 'E24', sweep: null };
      const match = await http().post('/api/rf/matching').set(as('procurement')).send(matching).expect(400);
      expect(match.body.fields).toEqual(expect.arrayContaining([expect.objectContaining({ field: 'sweep' })]));
    });
  });

  describe('numbers too large', () => {
    it('offset=1e20 on the audit log and a part history is a 400 naming offset', async () => {
      const part = await createDraft(app, tokens.engineer);
      for (const [path, role] of [
        ['/api/audit', 'admin'],
        [`/api/parts/${part.id}/history`, 'engineer'],
      ] as const) {
        for (const offset of ['1e20', '2147483648']) {
          const res = await http().get(path).query({ offset }).set(as(role));
          expect([path, offset, res.status, fieldsOf(res)]).toEqual([path, offset, 400, ['offset']]);
        }
      }
    });

    it('a 309-digit range bound is a 400 naming the parameter', async () => {
      const huge = '9'.repeat(309);
      const part = await createDraft(app, tokens.engineer);
      const search = await http()
        .get('/api/parts')
        .query({ covers: `1-${huge}` })
        .set(as('engineer'));
      expect([search.status, fieldsOf(search)]).toEqual([400, ['covers']]);
      const detail = await http()
        .get(`/api/parts/${part.id}`)
        .query({ ranges: `700-${huge}` })
        .set(as('engineer'));
      expect([detail.status, fieldsOf(detail)]).toEqual([400, ['ranges']]);
    });

    it('a refused CSV export answers its 400 as JSON with the field, not as a CSV attachment', async () => {
      const res = await http().get('/api/parts/export').query({ vswrMax: '1e309' }).set(as('engineer'));
      expect([res.status, res.type, res.headers['content-disposition'], fieldsOf(res)]).toEqual([400, 'application/json', undefined, ['vswrMax']]);
    });

    it('integer ids in bodies and paths beyond the INT range are 400s naming the field', async () => {
      const bandSet = await http()
        .post('/api/band-sets')
        .set(as('admin'))
        .send({ ...bandSetBody(), bandIds: [1e20] });
      expect([bandSet.status, fieldsOf(bandSet)]).toEqual([400, ['bandIds']]);
      const product = await createProduct();
      const radio = await http()
        .post(`/api/products/${product.id}/radios`)
        .set(as('engineer'))
        .send({ ...radioBody(), bands: [{ bandId: 2 ** 31 }] });
      expect([radio.status, fieldsOf(radio)]).toEqual([400, ['bands.0.bandId']]);
      const path = await http().get('/api/products/4294967296').set(as('engineer'));
      expect([path.status, fieldsOf(path)]).toEqual([400, ['id']]);
    });
  });

  describe('impossible dates', () => {
    it('2025-02-31, 9999-99-99, 0000-00-00 and a year far outside are 400s naming the field; 29 February of a leap year is kept', async () => {
      const part = await createDraft(app, tokens.engineer);
      const offer = { supplier: 'Brightwater Components', currency: 'USD', priceBreaks: [{ quantity: 1, unitPrice: '0.9000' }] };
      for (const lastCheckedOn of ['2025-02-31', '9999-99-99', '0000-00-00', '2025-13-01', '1899-12-31', '9999-12-31']) {
        const res = await http()
          .post(`/api/parts/${part.id}/offers`)
          .set(as('procurement'))
          .send({ ...offer, lastCheckedOn });
        expect([lastCheckedOn, res.status, fieldsOf(res)]).toEqual([lastCheckedOn, 400, ['lastCheckedOn']]);
      }
      const created = await http()
        .post(`/api/parts/${part.id}/offers`)
        .set(as('procurement'))
        .send({ ...offer, lastCheckedOn: '2024-02-29' })
        .expect(201);
      expect(JSON.stringify(created.body)).toContain('2024-02-29');
    });
  });

  describe('duplicates created in parallel', () => {
    const PARALLEL = 12;
    const statuses = (responses: request.Response[]) => responses.map((r) => r.status).sort();

    it('products by code: one 201, PRODUCT_CODE_TAKEN 409 for the rest', async () => {
      const body = productBody();
      const responses = await Promise.all(Array.from({ length: PARALLEL }, () => http().post('/api/products').set(as('engineer')).send(body)));
      expect(statuses(responses)).toEqual([201, ...Array(PARALLEL - 1).fill(409)]);
      expect(new Set(responses.filter((r) => r.status === 409).map((r) => r.body.code))).toEqual(new Set(['PRODUCT_CODE_TAKEN']));
    });

    it('band sets by name: one 201, BAND_SET_NAME_TAKEN 409 for the rest', async () => {
      const body = bandSetBody();
      const responses = await Promise.all(Array.from({ length: PARALLEL }, () => http().post('/api/band-sets').set(as('admin')).send(body)));
      expect(statuses(responses)).toEqual([201, ...Array(PARALLEL - 1).fill(409)]);
      expect(new Set(responses.filter((r) => r.status === 409).map((r) => r.body.code))).toEqual(new Set(['BAND_SET_NAME_TAKEN']));
    });

    it('invitations by e-mail: no 5xx, one account; a request that lost the race gets USER_EMAIL_TAKEN', async () => {
      const email = `${unique('invitee')}@bandwright.test`.toLowerCase();
      const responses = await Promise.all(
        Array.from({ length: 8 }, () => http().post('/api/users/invitations').set(as('admin')).send({ email, name: 'Parallel Invitee', role: 'engineer' })),
      );
      for (const res of responses) {
        expect([201, 409]).toContain(res.status);
        if (res.status === 409) expect(res.body.code).toBe('USER_EMAIL_TAKEN');
      }
      expect(responses.some((r) => r.status === 201)).toBe(true);
      const [row] = await app.get(DataSource).query('SELECT COUNT(*) AS n FROM users WHERE email = ?', [email]);
      expect(Number(row.n)).toBe(1);
    });

    it('shortlist and choice races are retried: every call succeeds and one part ends up chosen', async () => {
      const product = await createProduct();
      const radio = (await http().post(`/api/products/${product.id}/radios`).set(as('engineer')).send(radioBody()).expect(201)).body;
      const base = `/api/products/${product.id}/radios/${radio.id}`;
      const shortlists = await Promise.all(
        Array.from({ length: PARALLEL }, (_, i) =>
          http()
            .post(`${base}/shortlist`)
            .set(as('engineer'))
            .send({ partId: DEMO_PARTS[i % DEMO_PARTS.length] }),
        ),
      );
      expect(shortlists.map((r) => r.status).filter((s) => s >= 300)).toEqual([]);
      const choices = await Promise.all(
        Array.from({ length: PARALLEL }, (_, i) =>
          http()
            .put(`${base}/choice`)
            .set(as('engineer'))
            .send({ partId: DEMO_PARTS[i % DEMO_PARTS.length] }),
        ),
      );
      expect(choices.map((r) => r.status).filter((s) => s >= 300)).toEqual([]);
      const assignments = (await http().get(`/api/products/${product.id}/assignments`).set(as('engineer')).expect(200)).body as {
        radioId: number;
        partId: number;
        state: string;
      }[];
      const mine = assignments.filter((a) => a.radioId === radio.id);
      expect(mine.map((a) => a.partId).sort()).toEqual([...DEMO_PARTS].sort());
      expect(mine.filter((a) => a.state === 'chosen')).toHaveLength(1);
    });
  });
});
