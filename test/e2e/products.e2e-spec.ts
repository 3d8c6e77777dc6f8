import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { ProductsService } from '../../src-server/products/products.service';

type Method = 'get' | 'post' | 'patch' | 'delete';

describe('products and radios (API)', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  const http = () => request(app.getHttpServer());
  const call = (method: Method, path: string, role?: DemoRole, body?: object) => {
    const req = http()[method](path);
    if (role) req.set('Authorization', `Bearer ${tokens[role]}`);
    return body ? req.send(body) : req;
  };
  // The fields named in a 400, each once (one field can break several constraints).
  const fields = (res: request.Response) => [...new Set((res.body.fields as { field: string }[]).map((f) => f.field))];

  const productBody = () => ({
    name: unique('Test product'),
    code: unique('TP').slice(0, 40),
    owner: 'Test Owner',
    groundPlaneLengthMm: 80,
    groundPlaneWidthMm: 40,
    targetRegions: ['EU', 'US'],
    notes: 'e2e',
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
  const gnss = () => ({
    name: 'GNSS',
    technology: 'gnss',
    module: 'Test GNSS (invented)',
    transmitPowerDbm: null,
    polarization: 'RHCP',
    connector: 'solder-pad',
    feedLossDb: 0.2,
    bands: [{ bandId: 501 }, { bandId: 511 }],
  });
  const createProduct = async () => (await call('post', '/api/products', 'engineer', productBody()).expect(201)).body;

  let scratch: { id: number; version: number };
  let scratchRadio: { id: number; version: number };

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    scratch = await createProduct();
    scratchRadio = (await call('post', `/api/products/${scratch.id}/radios`, 'engineer', cellular()).expect(201)).body;
  });
  afterAll(() => app.close());

  describe('who may call each route', () => {
    const reads = () =>
      [
        ['get', '/api/products'],
        ['get', `/api/products/${scratch.id}`],
        ['get', `/api/products/${scratch.id}/history`],
        ['get', `/api/products/${scratch.id}/radios`],
        ['get', `/api/products/${scratch.id}/radios/${scratchRadio.id}`],
      ] as const;

    it('read routes: 401 anonymous, 200 for every role', async () => {
      for (const [method, path] of reads()) {
        await call(method, path).expect(401);
        for (const role of ['procurement', 'engineer', 'admin'] as const) await call(method, path, role).expect(200);
      }
    });

    it('write routes: 401 anonymous, 403 for procurement', async () => {
      const writes = [
        ['post', '/api/products', productBody()],
        ['patch', `/api/products/${scratch.id}`, { version: 1, notes: 'x' }],
        ['delete', `/api/products/${scratch.id}`, undefined],
        ['post', `/api/products/${scratch.id}/radios`, cellular()],
        ['patch', `/api/products/${scratch.id}/radios/${scratchRadio.id}`, { version: 1, name: 'x' }],
        ['delete', `/api/products/${scratch.id}/radios/${scratchRadio.id}`, undefined],
      ] as const;
      for (const [method, path, body] of writes) {
        await call(method, path, undefined, body).expect(401);
        const denied = await call(method, path, 'procurement', body).expect(403);
        expect(denied.body.code).toBe('FORBIDDEN_ROLE');
      }
      // Nothing happened to the product or its radio.
      const after = (await call('get', `/api/products/${scratch.id}`, 'admin').expect(200)).body;
      expect(after).toMatchObject({ version: scratch.version, radios: [{ id: scratchRadio.id, version: scratchRadio.version }] });
    });

    it.each(['engineer', 'admin'] as const)('write routes: 2xx for %s', async (role) => {
      const product = (await call('post', '/api/products', role, productBody()).expect(201)).body;
      const edited = (await call('patch', `/api/products/${product.id}`, role, { version: product.version, notes: `edited by ${role}` }).expect(200)).body;
      const radio = (await call('post', `/api/products/${product.id}/radios`, role, gnss()).expect(201)).body;
      await call('patch', `/api/products/${product.id}/radios/${radio.id}`, role, { version: radio.version, feedLossDb: 0.4 }).expect(200);
      await call('delete', `/api/products/${product.id}/radios/${radio.id}`, role).expect(204);
      await call('delete', `/api/products/${product.id}?version=${edited.version}`, role).expect(204);
      await call('get', `/api/products/${product.id}`, role).expect(404);
    });
  });

  describe('POST /api/products', () => {
    it('answers 400 naming the field for negative, absurd and missing values', async () => {
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), groundPlaneLengthMm: -5 }).expect(400))).toEqual([
        'groundPlaneLengthMm',
      ]);
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), groundPlaneWidthMm: 50000 }).expect(400))).toEqual([
        'groundPlaneWidthMm',
      ]);
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), groundPlaneWidthMm: 'wide' }).expect(400))).toContain(
        'groundPlaneWidthMm',
      );
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), targetRegions: ['EU', 'Mars'] }).expect(400))).toEqual([
        'targetRegions',
      ]);
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), name: undefined }).expect(400))).toContain('name');
      expect(fields(await call('post', '/api/products', 'engineer', { ...productBody(), version: 4 }).expect(400))).toEqual(['version']);
    });

    it('answers 409 for a code another product has', async () => {
      const res = await call('post', '/api/products', 'engineer', { ...productBody(), code: 'DEMO-LT1' }).expect(409);
      expect(res.body).toMatchObject({ code: 'PRODUCT_CODE_TAKEN', field: 'code' });
    });

    it('creates a product at version 1 and records who created it', async () => {
      const input = productBody();
      const created = await call('post', '/api/products', 'engineer', input).expect(201);
      expect(created.body).toMatchObject({ ...input, version: 1, radios: [], radioCount: 0 });
      const history = await call('get', `/api/products/${created.body.id}/history`, 'procurement').expect(200);
      expect(history.body.items[0]).toMatchObject({ action: 'created', user: { name: 'Eli Marsh' }, changes: { code: input.code } });
    });
  });

  describe('GET /api/products and /api/products/:id', () => {
    it('answers 400 for a bad id and 404 for an unknown one', async () => {
      expect(fields(await call('get', '/api/products/abc', 'engineer').expect(400))).toEqual(['id']);
      expect((await call('get', '/api/products/999999', 'engineer').expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
    });

    it('lists the demo products', async () => {
      const res = await call('get', '/api/products', 'procurement').expect(200);
      const tracker = res.body.find((p: { id: number }) => p.id === 1);
      expect(tracker).toMatchObject({ code: 'DEMO-LT1', radioCount: 3, targetRegions: ['EU', 'US'] });
      expect(tracker.technologies.sort()).toEqual(['ble', 'gnss', 'lte']);
    });

    it('returns the demo tracker with its radios, bands, ranges and certified gains', async () => {
      const res = await call('get', '/api/products/1', 'procurement').expect(200);
      expect(res.body.radios.map((r: { id: number }) => r.id)).toEqual([11, 12, 13]);
      const cell = res.body.radios[0];
      expect(cell).toMatchObject({ technology: 'lte', transmitPowerDbm: 23, receiveOnly: false, feedLossDb: 0.3 });
      const b12 = cell.bands.find((b: { band: { designation: string } }) => b.band.designation === 'B12');
      // 3GPP TS 36.101 Table 5.5-1: band 12 UL 699–716, DL 729–746 MHz.
      expect(b12).toEqual({
        certifiedMaxGainDbi: 8.5,
        channels: null,
        band: expect.objectContaining({
          id: 112,
          ranges: [
            { role: 'uplink', fromMhz: 699, toMhz: 716 },
            { role: 'downlink', fromMhz: 729, toMhz: 746 },
          ],
        }),
      });
      expect(res.body.radios[1]).toMatchObject({
        technology: 'gnss',
        transmitPowerDbm: null,
        receiveOnly: true,
        polarization: 'RHCP',
        gnssBandwidth: 'main-lobe',
      });
    });

    it('ProductsService.getWithRadios gives other domains the same detail', async () => {
      const detail = await app.get(ProductsService).getWithRadios(2);
      expect(detail).toMatchObject({ code: 'DEMO-CG2', groundPlaneLengthMm: 140, groundPlaneWidthMm: 90, targetRegions: ['EU', 'US'] });
      const lora = detail.radios.find((r) => r.id === 23)!;
      // LoRaWAN RP002-1.0.x: EU863-870 is 863–870 MHz, US902-928 is 902–928 MHz.
      expect(lora.bands.map((b) => [b.band.designation, b.band.ranges[0].fromMhz, b.band.ranges[0].toMhz, b.certifiedMaxGainDbi])).toEqual([
        ['EU863-870', 863, 870, 3],
        ['US902-928', 902, 928, 6],
      ]);
    });
  });

  describe('PATCH /api/products/:id', () => {
    it('answers 400 without a version and 409 for a stale one, overwriting nothing', async () => {
      const product = await createProduct();
      expect(fields(await call('patch', `/api/products/${product.id}`, 'engineer', { notes: 'no version' }).expect(400))).toEqual(['version']);
      const first = await call('patch', `/api/products/${product.id}`, 'engineer', { version: 1, owner: 'First Editor' }).expect(200);
      expect(first.body.version).toBe(2);
      const stale = await call('patch', `/api/products/${product.id}`, 'admin', { version: 1, owner: 'Second Editor', groundPlaneLengthMm: 10 }).expect(409);
      expect(stale.body).toMatchObject({ code: 'PRODUCT_VERSION_CONFLICT', expectedVersion: 1, currentVersion: 2 });
      const now = (await call('get', `/api/products/${product.id}`, 'engineer').expect(200)).body;
      expect(now).toMatchObject({ owner: 'First Editor', groundPlaneLengthMm: 80, version: 2 });
    });

    it('answers 400 for an absurd size and 409 for a taken code, leaving the product as it was', async () => {
      const product = await createProduct();
      expect(fields(await call('patch', `/api/products/${product.id}`, 'engineer', { version: 1, groundPlaneLengthMm: 0 }).expect(400))).toEqual([
        'groundPlaneLengthMm',
      ]);
      await call('patch', `/api/products/${product.id}`, 'engineer', { version: 1, code: 'DEMO-CG2' }).expect(409);
      expect((await call('get', `/api/products/${product.id}`, 'engineer').expect(200)).body).toMatchObject({ code: product.code, version: 1 });
    });

    it('records the changed fields as [before, after]', async () => {
      const product = await createProduct();
      await call('patch', `/api/products/${product.id}`, 'admin', { version: 1, groundPlaneWidthMm: 35, targetRegions: ['EU'] }).expect(200);
      const [latest] = (await call('get', `/api/products/${product.id}/history`, 'engineer').expect(200)).body.items;
      expect(latest).toMatchObject({
        action: 'updated',
        user: { name: 'Ada Okonkwo' },
        changes: { groundPlaneWidthMm: [40, 35], targetRegions: [['EU', 'US'], ['EU']] },
      });
    });
  });

  describe('DELETE /api/products/:id', () => {
    it('answers 409 for a stale version and keeps the product; then deletes it with its radios', async () => {
      const product = await createProduct();
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', gnss()).expect(201)).body;
      await call('patch', `/api/products/${product.id}`, 'engineer', { version: 1, notes: 'bumped' }).expect(200);
      expect((await call('delete', `/api/products/${product.id}?version=1`, 'engineer').expect(409)).body.code).toBe('PRODUCT_VERSION_CONFLICT');
      await call('get', `/api/products/${product.id}/radios/${radio.id}`, 'engineer').expect(200);
      await call('delete', `/api/products/${product.id}?version=2`, 'engineer').expect(204);
      await call('get', `/api/products/${product.id}/radios/${radio.id}`, 'engineer').expect(404);
      expect((await call('get', `/api/audit?entityType=product&entityId=${product.id}`, 'admin').expect(200)).body.items[0]).toMatchObject({
        action: 'deleted',
        changes: { radioCount: 1 },
      });
    });
  });

  describe('POST /api/products/:id/radios', () => {
    it('answers 404 for an unknown product', async () => {
      expect((await call('post', '/api/products/999999/radios', 'engineer', cellular()).expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
    });

    it('answers 400 naming the band for a band of another technology, an unknown band and a repeated band', async () => {
      const wifiOnLte = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', {
        ...cellular(),
        bands: [{ bandId: 601, certifiedMaxGainDbi: 3 }],
      }).expect(400);
      expect(wifiOnLte.body.fields).toEqual([{ field: 'bands.0.bandId', message: expect.stringMatching(/wifi band.*lte radio/) }]);
      const nrOnLte = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', {
        ...cellular(),
        bands: [
          { bandId: 103, certifiedMaxGainDbi: 5 },
          { bandId: 378, certifiedMaxGainDbi: 5 },
        ],
      }).expect(400);
      expect(fields(nrOnLte)).toEqual(['bands.1.bandId']);
      const unknown = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', {
        ...cellular(),
        bands: [{ bandId: 103 }, { bandId: 999999 }],
      }).expect(400);
      expect(unknown.body.fields).toEqual([{ field: 'bands.1.bandId', message: expect.stringContaining('999999') }]);
      const twice = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', { ...cellular(), bands: [{ bandId: 103 }, { bandId: 103 }] }).expect(
        400,
      );
      expect(fields(twice)).toEqual(['bands.1.bandId']);
      const none = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', { ...cellular(), bands: [] }).expect(400);
      expect(fields(none)).toEqual(['bands']);
    });

    it('answers 400 for transmit power on a receive-only radio, and for a transmitter without one', async () => {
      const gnssTx = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', { ...gnss(), transmitPowerDbm: 10 }).expect(400);
      expect(gnssTx.body.fields).toEqual([{ field: 'transmitPowerDbm', message: expect.stringContaining('receive-only') }]);
      const gnssGain = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', {
        ...gnss(),
        bands: [{ bandId: 501, certifiedMaxGainDbi: 3 }],
      }).expect(400);
      expect(fields(gnssGain)).toEqual(['bands.0.certifiedMaxGainDbi']);
      const silent = await call('post', `/api/products/${scratch.id}/radios`, 'engineer', { ...cellular(), transmitPowerDbm: null }).expect(400);
      expect(fields(silent)).toEqual(['transmitPowerDbm']);
    });

    it('answers 400 naming the field for absurd numbers and unknown choices', async () => {
      const post = (patch: object) => call('post', `/api/products/${scratch.id}/radios`, 'engineer', { ...cellular(), ...patch }).expect(400);
      expect(fields(await post({ transmitPowerDbm: 60 }))).toEqual(['transmitPowerDbm']);
      expect(fields(await post({ feedLossDb: -1 }))).toEqual(['feedLossDb']);
      expect(fields(await post({ polarization: 'diagonal' }))).toEqual(['polarization']);
      expect(fields(await post({ connector: 'banana' }))).toEqual(['connector']);
      expect(fields(await post({ technology: 'lte-m' }))).toEqual(['technology']);
      expect(fields(await post({ bands: [{ bandId: 103, certifiedMaxGainDbi: 45 }] }))).toEqual(['bands.0.certifiedMaxGainDbi']);
      expect(fields(await post({ bands: [{ bandId: 'B3' }] }))).toContain('bands.0.bandId');
    });

    it('creates a cellular and a GNSS radio, and a rejected radio leaves nothing behind', async () => {
      const product = await createProduct();
      await call('post', `/api/products/${product.id}/radios`, 'engineer', { ...gnss(), transmitPowerDbm: 5 }).expect(400);
      const cell = await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(201);
      expect(cell.body).toMatchObject({
        productId: product.id,
        version: 1,
        receiveOnly: false,
        bands: [
          { certifiedMaxGainDbi: 5, band: { designation: 'B3' } },
          { certifiedMaxGainDbi: 4.5, band: { designation: 'B20' } },
        ],
      });
      const rx = await call('post', `/api/products/${product.id}/radios`, 'engineer', gnss()).expect(201);
      expect(rx.body).toMatchObject({
        receiveOnly: true,
        transmitPowerDbm: null,
        bands: [{ certifiedMaxGainDbi: null, band: { designation: 'GPS L1' } }, { band: { designation: 'Galileo E1' } }],
      });
      const detail = (await call('get', `/api/products/${product.id}`, 'procurement').expect(200)).body;
      expect(detail.radios.map((r: { name: string }) => r.name)).toEqual(['Cellular', 'GNSS']);
      const history = (await call('get', `/api/products/${product.id}/history`, 'engineer').expect(200)).body.items;
      expect(history.map((e: { action: string }) => e.action)).toEqual(['radio-created', 'radio-created', 'created']);
      expect(history[1].changes).toMatchObject({ radioId: cell.body.id, bands: ['B3 (5 dBi)', 'B20 (4.5 dBi)'] });
    });
  });

  describe('PATCH /api/products/:id/radios/:radioId', () => {
    it('answers 404 for a radio of another product', async () => {
      expect((await call('patch', '/api/products/1/radios/21', 'engineer', { version: 1, name: 'x' }).expect(404)).body.code).toBe('RADIO_NOT_FOUND');
      await call('get', '/api/products/1/radios/21', 'engineer').expect(404);
    });

    it('answers 409 for a stale version and overwrites nothing', async () => {
      const product = await createProduct();
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(201)).body;
      const first = await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', { version: 1, transmitPowerDbm: 20 }).expect(200);
      expect(first.body.version).toBe(2);
      const stale = await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'admin', {
        version: 1,
        transmitPowerDbm: 26,
        bands: [{ bandId: 108, certifiedMaxGainDbi: 2 }],
      }).expect(409);
      expect(stale.body).toMatchObject({ code: 'RADIO_VERSION_CONFLICT', expectedVersion: 1, currentVersion: 2 });
      const now = (await call('get', `/api/products/${product.id}/radios/${radio.id}`, 'engineer').expect(200)).body;
      expect(now).toMatchObject({ version: 2, transmitPowerDbm: 20 });
      expect(now.bands.map((b: { band: { id: number } }) => b.band.id)).toEqual([103, 120]);
    });

    it('re-checks the merged radio: a technology change must fit the existing bands', async () => {
      const product = await createProduct();
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(201)).body;
      const res = await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', { version: 1, technology: 'nr' }).expect(400);
      expect(fields(res)).toEqual(['bands.0.bandId', 'bands.1.bandId']);
      const toGnss = await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', {
        version: 1,
        technology: 'gnss',
        bands: [{ bandId: 501 }],
      }).expect(400);
      expect(fields(toGnss)).toEqual(['transmitPowerDbm']);
      expect((await call('get', `/api/products/${product.id}/radios/${radio.id}`, 'engineer').expect(200)).body).toMatchObject({
        technology: 'lte',
        version: 1,
      });
    });

    it('replaces the bands and records the change with before and after', async () => {
      const product = await createProduct();
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', cellular()).expect(201)).body;
      const res = await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', {
        version: 1,
        bands: [
          { bandId: 108, certifiedMaxGainDbi: 4 },
          { bandId: 120, certifiedMaxGainDbi: 4.5 },
        ],
      }).expect(200);
      expect(res.body.bands.map((b: { band: { designation: string } }) => b.band.designation)).toEqual(['B8', 'B20']);
      const [latest] = (await call('get', `/api/products/${product.id}/history`, 'engineer').expect(200)).body.items;
      expect(latest).toMatchObject({
        action: 'radio-updated',
        changes: {
          radioId: radio.id,
          bands: [
            ['B3 (5 dBi)', 'B20 (4.5 dBi)'],
            ['B8 (4 dBi)', 'B20 (4.5 dBi)'],
          ],
        },
      });
    });
  });

  describe('DELETE /api/products/:id/radios/:radioId', () => {
    it('answers 409 for a stale version, then removes the radio with an audit entry', async () => {
      const product = await createProduct();
      const radio = (await call('post', `/api/products/${product.id}/radios`, 'engineer', gnss()).expect(201)).body;
      await call('patch', `/api/products/${product.id}/radios/${radio.id}`, 'engineer', { version: 1, feedLossDb: 0.3 }).expect(200);
      expect((await call('delete', `/api/products/${product.id}/radios/${radio.id}?version=1`, 'engineer').expect(409)).body.code).toBe(
        'RADIO_VERSION_CONFLICT',
      );
      await call('delete', `/api/products/${product.id}/radios/${radio.id}?version=2`, 'engineer').expect(204);
      expect((await call('get', `/api/products/${product.id}`, 'engineer').expect(200)).body.radios).toEqual([]);
      const [latest] = (await call('get', `/api/products/${product.id}/history`, 'engineer').expect(200)).body.items;
      expect(latest).toMatchObject({ action: 'radio-deleted', user: { name: 'Eli Marsh' }, changes: { radioId: radio.id, radio: 'GNSS' } });
    });
  });

  describe('GET /api/products/:id/history', () => {
    it('answers 404 for an unknown product', async () => {
      expect((await call('get', '/api/products/999999/history', 'engineer').expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
    });
  });
});
