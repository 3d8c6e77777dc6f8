import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { basisFields, createDraft, csvCurve, s1pWithGamma } from '../support/parts';
import { BACKFILL_PRODUCT_CREATORS } from '../../src-server/database/migrations/1765310000000-ownership-and-locking';

type Method = 'get' | 'post' | 'patch' | 'delete' | 'put';

// Demo data (catalog-seed): an approved chip antenna the candidates of a cellular radio can list.
const APPROVED_PART = 1029;

/** Issue 10, data ownership and edits: who created a product, soft delete and restore, band set locking, downloads. */
describe('data ownership and edits (API)', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  let ids: Record<DemoRole, number>;
  const http = () => request(app.getHttpServer());
  const call = (method: Method, path: string, role?: DemoRole, body?: object) => {
    const req = http()[method](path);
    if (role) req.set('Authorization', `Bearer ${tokens[role]}`);
    return body ? req.send(body) : req;
  };
  const productBody = () => ({
    name: unique('Owned product'),
    code: unique('OWN').slice(0, 40),
    owner: 'Test Owner',
    groundPlaneLengthMm: 80,
    groundPlaneWidthMm: 40,
    targetRegions: ['EU'],
  });
  const cellular = () => ({
    name: 'Cellular',
    technology: 'lte',
    module: 'Test modem (invented)',
    transmitPowerDbm: 23,
    polarization: 'linear',
    connector: 'solder-pad',
    feedLossDb: 0.5,
    bands: [
      { bandId: 103, certifiedMaxGainDbi: 5 },
      { bandId: 120, certifiedMaxGainDbi: 4.5 },
    ],
  });
  const createProduct = async (role: DemoRole = 'engineer') =>
    (await call('post', '/api/products', role, productBody()).expect(201)).body as { id: number; code: string; version: number };
  const binary = (req: request.Test) =>
    req.buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    const me = async (role: DemoRole) => (await call('get', '/api/auth/me', role).expect(200)).body.id as number;
    ids = { admin: await me('admin'), engineer: await me('engineer'), procurement: await me('procurement') };
  }, 30_000);
  afterAll(() => app.close());

  describe('products record who created them', () => {
    it('names the creator (by name, not e-mail) on the product and in the list', async () => {
      const product = (await call('post', '/api/products', 'engineer', productBody()).expect(201)).body;
      expect(product.createdBy).toEqual({ id: ids.engineer, name: expect.any(String) });
      expect(JSON.stringify(product.createdBy)).not.toContain('@');
      const listed = (await call('get', '/api/products', 'procurement').expect(200)).body.find((p: { id: number }) => p.id === product.id);
      expect(listed).toMatchObject({ createdBy: { id: ids.engineer }, deletedAt: null });
    });

    it("the migration's backfill takes an older product's creator from its audit entry", async () => {
      const product = await createProduct('engineer');
      const ds = app.get<DataSource>(getDataSourceToken());
      // As a product created before the column existed looks.
      await ds.query('UPDATE products SET created_by_id = NULL WHERE id = ?', [product.id]);
      await ds.query(BACKFILL_PRODUCT_CREATORS);
      const [row] = await ds.query('SELECT created_by_id AS createdById FROM products WHERE id = ?', [product.id]);
      expect(row.createdById).toBe(ids.engineer);
    });
  });

  describe('DELETE /api/products/:id', () => {
    it("answers 403 PRODUCT_DELETE_FORBIDDEN to an engineer deleting someone else's product, and deletes nothing", async () => {
      const adminsProduct = await createProduct('admin');
      const denied = await call('delete', `/api/products/${adminsProduct.id}`, 'engineer').expect(403);
      expect(denied.body.code).toBe('PRODUCT_DELETE_FORBIDDEN');
      await call('get', `/api/products/${adminsProduct.id}`, 'engineer').expect(200);
      const ds = app.get<DataSource>(getDataSourceToken());
      const [row] = await ds.query('SELECT created_by_id AS createdById FROM products WHERE id = ?', [adminsProduct.id]);
      expect(row.createdById).toBe(ids.admin);
    });

    it('lets only admins delete a product whose creator is unknown', async () => {
      const product = await createProduct('engineer');
      const ds = app.get<DataSource>(getDataSourceToken());
      await ds.query('UPDATE products SET created_by_id = NULL WHERE id = ?', [product.id]);
      expect((await call('delete', `/api/products/${product.id}`, 'engineer').expect(403)).body.code).toBe('PRODUCT_DELETE_FORBIDDEN');
      await call('delete', `/api/products/${product.id}`, 'admin').expect(204);
    });

    it('is a soft delete: gone from lists, detail, radios, matrix, candidates and assignments; an admin restores it with its radios and assignments', async () => {
      const product = await createProduct('engineer');
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(201)).body;
      await call('post', `/api/products/${product.id}/radios/${radio.id}/shortlist`, 'engineer', { partId: APPROVED_PART }).expect(201);
      await call('get', `/api/products/${product.id}/matrix`, 'engineer').expect(200);

      await call('delete', `/api/products/${product.id}`, 'engineer').expect(204);
      const listed = (await call('get', '/api/products', 'admin').expect(200)).body as { id: number }[];
      expect(listed.map((p) => p.id)).not.toContain(product.id);
      for (const path of ['', '/radios', `/radios/${radio.id}`, '/matrix', `/radios/${radio.id}/candidates`, '/assignments']) {
        expect((await call('get', `/api/products/${product.id}${path}`, 'engineer').expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
      }
      expect((await call('patch', `/api/products/${product.id}`, 'engineer', { version: product.version, notes: 'x' }).expect(404)).body.code).toBe(
        'PRODUCT_NOT_FOUND',
      );
      expect((await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
      expect(
        (await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', { version: radio.version, name: 'x' }).expect(404)).body.code,
      ).toBe('PRODUCT_NOT_FOUND');
      expect((await call('delete', `/api/products/${product.id}/radios/${radio.id}/shortlist/${APPROVED_PART}`, 'engineer').expect(404)).body.code).toBe(
        'PRODUCT_NOT_FOUND',
      );
      expect((await call('put', `/api/products/${product.id}/radios/${radio.id}/choice`, 'engineer', { partId: APPROVED_PART }).expect(404)).body.code).toBe(
        'PRODUCT_NOT_FOUND',
      );
      expect((await call('delete', `/api/products/${product.id}`, 'engineer').expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');

      // Admins see it among the deleted, with who deleted it; nobody else may ask.
      expect((await call('get', '/api/products?deleted=true', 'engineer').expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      const deleted = (await call('get', '/api/products?deleted=true', 'admin').expect(200)).body as {
        id: number;
        deletedAt: string | null;
        deletedBy: { id: number } | null;
        radioCount: number;
      }[];
      expect(deleted.find((p) => p.id === product.id)).toMatchObject({ deletedAt: expect.any(String), deletedBy: { id: ids.engineer }, radioCount: 1 });

      // Only admins restore.
      expect((await call('post', `/api/products/${product.id}/restore`, 'engineer').expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      const restored = (await call('post', `/api/products/${product.id}/restore`, 'admin').expect(200)).body;
      expect(restored).toMatchObject({
        id: product.id,
        deletedAt: null,
        deletedBy: null,
        radios: [{ id: radio.id, bands: [{ band: { id: 103 } }, { band: { id: 120 } }] }],
      });
      expect((await call('post', `/api/products/${product.id}/restore`, 'admin').expect(409)).body.code).toBe('PRODUCT_NOT_DELETED');
      const assignments = (await call('get', `/api/products/${product.id}/assignments`, 'procurement').expect(200)).body;
      expect(assignments).toEqual([expect.objectContaining({ radioId: radio.id, partId: APPROVED_PART, state: 'shortlisted' })]);
      const matrix = (await call('get', `/api/products/${product.id}/matrix`, 'engineer').expect(200)).body;
      expect(matrix.columns.map((c: { partId: number }) => c.partId)).toEqual([APPROVED_PART]);
      expect((await call('get', '/api/products', 'engineer').expect(200)).body.map((p: { id: number }) => p.id)).toContain(product.id);
      expect((await call('get', '/api/products?deleted=true', 'admin').expect(200)).body.map((p: { id: number }) => p.id)).not.toContain(product.id);

      // The audit log says who deleted and who restored.
      const history = (await call('get', `/api/products/${product.id}/history`, 'admin').expect(200)).body.items as {
        action: string;
        user: { id: number } | null;
      }[];
      expect(history.slice(0, 2).map((e) => [e.action, e.user?.id])).toEqual([
        ['restored', ids.admin],
        ['deleted', ids.engineer],
      ]);
    });

    it("keeps a deleted product's code taken (409 PRODUCT_CODE_TAKEN_BY_DELETED) until it is restored, and never 5xx", async () => {
      const product = await createProduct('engineer');
      await call('delete', `/api/products/${product.id}`, 'engineer').expect(204);
      const again = await call('post', '/api/products', 'engineer', { ...productBody(), code: product.code }).expect(409);
      expect(again.body).toMatchObject({ code: 'PRODUCT_CODE_TAKEN_BY_DELETED', field: 'code', productId: product.id });
      const other = await createProduct('engineer');
      const renamed = await call('patch', `/api/products/${other.id}`, 'engineer', { version: other.version, code: product.code }).expect(409);
      expect(renamed.body.code).toBe('PRODUCT_CODE_TAKEN_BY_DELETED');
      await call('post', `/api/products/${product.id}/restore`, 'admin').expect(200);
      expect((await call('post', '/api/products', 'engineer', { ...productBody(), code: product.code }).expect(409)).body.code).toBe('PRODUCT_CODE_TAKEN');
    });

    it('lets an admin read the history of a deleted product; others get 404', async () => {
      const product = await createProduct('engineer');
      await call('delete', `/api/products/${product.id}`, 'admin').expect(204);
      await call('get', `/api/products/${product.id}/history`, 'engineer').expect(404);
      const history = (await call('get', `/api/products/${product.id}/history`, 'admin').expect(200)).body.items;
      expect(history[0]).toMatchObject({ action: 'deleted', user: { id: ids.admin } });
      await call('post', '/api/products/999999999/restore', 'admin').expect(404);
    });
  });

  describe('PATCH /api/band-sets/:id (optimistic locking)', () => {
    const setBody = () => ({ name: unique('Locked set'), description: 'Test set; operators vary, check them.', bandIds: [103, 120] });

    it('answers 400 without a version and 409 BAND_SET_VERSION_CONFLICT for a stale one, changing nothing', async () => {
      const set = (await call('post', '/api/band-sets', 'admin', setBody()).expect(201)).body;
      expect(set.version).toBe(1);
      const missing = await call('patch', `/api/band-sets/${set.id}`, 'admin', { description: 'no version' }).expect(400);
      expect(missing.body.fields.map((f: { field: string }) => f.field)).toContain('version');
      await call('patch', `/api/band-sets/${set.id}`, 'admin', { version: 1, description: 'first' }).expect(200);
      const stale = await call('patch', `/api/band-sets/${set.id}`, 'admin', { version: 1, bandIds: [108] }).expect(409);
      expect(stale.body).toMatchObject({ code: 'BAND_SET_VERSION_CONFLICT', currentVersion: 2 });
      expect((await call('get', `/api/band-sets/${set.id}`, 'admin').expect(200)).body).toMatchObject({
        version: 2,
        description: 'first',
        bandIds: [103, 120],
      });
      expect((await call('delete', `/api/band-sets/${set.id}?version=1`, 'admin').expect(409)).body.code).toBe('BAND_SET_VERSION_CONFLICT');
      await call('delete', `/api/band-sets/${set.id}?version=2`, 'admin').expect(204);
    });

    it('30 parallel edits of the same version: exactly one 200, 409 BAND_SET_VERSION_CONFLICT for the rest', async () => {
      const set = (await call('post', '/api/band-sets', 'admin', setBody()).expect(201)).body;
      const edits = await Promise.all(
        Array.from({ length: 30 }, (_, i) => call('patch', `/api/band-sets/${set.id}`, 'admin', { version: set.version, description: `edit ${i}` })),
      );
      const statuses = edits.map((r) => r.status).sort();
      expect(statuses.filter((s) => s === 200)).toHaveLength(1);
      expect(statuses.filter((s) => s === 409)).toHaveLength(29);
      expect(new Set(edits.filter((r) => r.status === 409).map((r) => r.body.code))).toEqual(new Set(['BAND_SET_VERSION_CONFLICT']));
      const winner = edits.find((r) => r.status === 200)!.body;
      expect((await call('get', `/api/band-sets/${set.id}`, 'admin').expect(200)).body).toMatchObject({ version: 2, description: winner.description });
    }, 30_000);
  });

  describe('GET /api/parts/:id/measurements/:measurementId/file', () => {
    const upload = (partId: number, kind: string, name: string, content: string, declaredType: string) =>
      http()
        .post(`/api/parts/${partId}/measurements`)
        .set('Authorization', `Bearer ${tokens.engineer}`)
        .field({ kind, ...basisFields(kind) })
        .attach('file', Buffer.from(content), { filename: name, contentType: declaredType });

    it('serves a Touchstone file as text/plain and a CSV as text/csv, never as the uploader declared, with nosniff and as an attachment', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const s11 = await upload(
        draft.id,
        's11',
        'looks-like-a-page.s1p',
        s1pWithGamma([
          [800, 0.2],
          [900, 0.3],
        ]),
        'text/html',
      ).expect(201);
      const csv = await upload(
        draft.id,
        'efficiency',
        'efficiency.csv',
        csvCurve('frequency (MHz),efficiency (%)', [
          [800, 50],
          [900, 60],
        ]),
        'image/svg+xml',
      ).expect(201);
      for (const [measurement, type] of [
        [s11.body.measurement, 'text/plain'],
        [csv.body.measurement, 'text/csv'],
      ] as const) {
        const res = await binary(call('get', `/api/parts/${draft.id}/measurements/${measurement.id}/file`, 'procurement')).expect(200);
        expect(res.headers['content-type'].split(';')[0]).toBe(type);
        expect(res.headers['x-content-type-options']).toBe('nosniff');
        expect(res.headers['content-disposition']).toMatch(/^attachment;/);
      }
    });

    it.each([['Messung-Bänder-µ.s1p'], ['測定.s1p'], ["antenne (rev 2) l'été*📡.s1p"]])(
      'stores and returns the non-ASCII file name %s as UTF-8 (RFC 5987 filename*)',
      async (name) => {
        const draft = await createDraft(app, tokens.engineer);
        const res = await upload(
          draft.id,
          's11',
          name,
          s1pWithGamma([
            [800, 0.2],
            [900, 0.3],
          ]),
          'application/octet-stream',
        ).expect(201);
        expect(res.body.measurement.fileName).toBe(name);
        const detail = await call('get', `/api/parts/${draft.id}`, 'engineer').expect(200);
        expect(detail.body.measurements.map((m: { fileName: string }) => m.fileName)).toEqual([name]);
        const file = await binary(call('get', `/api/parts/${draft.id}/measurements/${res.body.measurement.id}/file`, 'engineer')).expect(200);
        const disposition: string = file.headers['content-disposition'];
        const encoded = /filename\*=UTF-8''([^;\s]+)/.exec(disposition)?.[1];
        // attr-char of RFC 5987 (section 3.2.1): letters, digits and !#$&+-.^_`|~, everything else percent-encoded.
        expect(encoded).toMatch(/^[\w!#$&+\-.^`|~%]+$/);
        expect(decodeURIComponent(encoded!)).toBe(name);
        // The ASCII fallback is plain printable ASCII.
        expect(/filename="([^"]*)"/.exec(disposition)?.[1]).toMatch(/^[\x20-\x7e]+$/);
      },
    );
  });
});
