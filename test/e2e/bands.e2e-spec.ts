import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, type DemoRole, unique } from '../support/api-app';
import { RegulatoryLimitsService } from '../../src-server/regulatory/regulatory-limits.service';
import { BandsService } from '../../src-server/bands/bands.service';

type Method = 'get' | 'post' | 'patch' | 'delete';

describe('band library, band sets and regulatory limits (API)', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  const http = () => request(app.getHttpServer());
  const call = (method: Method, path: string, role?: DemoRole, body?: object) => {
    const req = http()[method](path);
    if (role) req.set('Authorization', `Bearer ${tokens[role]}`);
    return body ? req.send(body) : req;
  };
  const auditOf = async (entityType: string, entityId: number) =>
    // Newest first; only the last three matter here (an id freed by a rolled-back insert can be reused).
    (
      (await call('get', `/api/audit?entityType=${entityType}&entityId=${entityId}`, 'admin').expect(200)).body.items as {
        action: string;
        user: { email: string } | null;
        changes: Record<string, unknown>;
      }[]
    ).slice(0, 3);

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  const newBand = () => ({
    technology: 'ism',
    designation: unique('T').slice(0, 38),
    name: 'Test sub-GHz band',
    duplex: 'half-duplex',
    ranges: [{ role: 'transmit-receive', fromMhz: 433.05, toMhz: 434.79 }],
    regions: ['EU'],
    sourceDocument: 'ERC/REC 70-03',
    sourceTable: 'Annex 1',
    sourceNote: 'test data',
  });

  describe('GET /api/bands', () => {
    it('answers 401 without a token', async () => {
      expect((await call('get', '/api/bands').expect(401)).body.code).toBe('AUTH_REQUIRED');
    });

    it.each(['procurement', 'engineer', 'admin'] as const)('answers 200 for %s', async (role) => {
      await call('get', '/api/bands', role).expect(200);
    });

    it('answers 400 naming the field for bad filters', async () => {
      const half = await call('get', '/api/bands?fromMhz=700', 'engineer').expect(400);
      expect(half.body.fields[0].field).toBe('toMhz');
      const reversed = await call('get', '/api/bands?fromMhz=900&toMhz=800', 'engineer').expect(400);
      expect(reversed.body.fields[0].field).toBe('toMhz');
      const tech = await call('get', '/api/bands?technology=radar', 'engineer').expect(400);
      expect(tech.body.fields[0].field).toBe('technology');
      const notNumber = await call('get', '/api/bands?fromMhz=abc&toMhz=900', 'engineer').expect(400);
      expect(notNumber.body.fields[0].field).toBe('fromMhz');
    });

    it('returns B12 in the documented shape with its source and release note', async () => {
      const res = await call('get', '/api/bands?designation=B12', 'procurement').expect(200);
      expect(res.body).toHaveLength(1);
      expect(res.body[0]).toEqual(
        expect.objectContaining({
          id: 112,
          technology: 'lte',
          designation: 'B12',
          duplex: 'FDD',
          // 3GPP TS 36.101 Table 5.5-1 (current release): UL 699–716, DL 729–746 MHz
          ranges: [
            { role: 'uplink', fromMhz: 699, toMhz: 716 },
            { role: 'downlink', fromMhz: 729, toMhz: 746 },
          ],
          source: { document: '3GPP TS 36.101', table: expect.stringContaining('5.5-1'), note: expect.stringContaining('698') },
        }),
      );
    });

    it('filters by technology', async () => {
      const res = await call('get', '/api/bands?technology=nr', 'engineer').expect(200);
      expect(res.body.length).toBeGreaterThanOrEqual(12);
      expect(res.body.every((b: { technology: string }) => b.technology === 'nr')).toBe(true);
      // 3GPP TS 38.101-1 Table 5.2-1: n78 3300–3800 MHz TDD
      expect(res.body.find((b: { designation: string }) => b.designation === 'n78')).toMatchObject({
        duplex: 'TDD',
        ranges: [{ role: 'tdd', fromMhz: 3300, toMhz: 3800 }],
      });
    });

    it('filters by overlap with a frequency window and by a single frequency', async () => {
      // Upper L-band RNSS 1559–1610 MHz holds L1/E1/B1I/B1C/G1 but not L5 (ITU RR Art. 5, RNSS allocation; from memory).
      const upper = (await call('get', '/api/bands?technology=gnss&fromMhz=1559&toMhz=1610', 'engineer').expect(200)).body.map(
        (b: { designation: string }) => b.designation,
      );
      expect(upper).toEqual(expect.arrayContaining(['GPS L1', 'Galileo E1', 'GLONASS G1', 'BeiDou B1I', 'BeiDou B1C']));
      expect(upper).not.toContain('GPS L5');
      // 1575.42 MHz lies in GPS L1, Galileo E1 and BeiDou B1C, not in B1I (1559.052–1563.144).
      const point = (await call('get', '/api/bands?fromMhz=1575.42&toMhz=1575.42', 'engineer').expect(200)).body.map(
        (b: { designation: string }) => b.designation,
      );
      expect(point).toEqual(expect.arrayContaining(['GPS L1', 'Galileo E1', 'BeiDou B1C']));
      expect(point).not.toContain('BeiDou B1I');
      // 700 MHz: B12 uplink (699–716), B17 (704–716 uplink starts above 700) no, B28 uplink 703– no, B85 uplink 698–716 yes.
      const at700 = (await call('get', '/api/bands?technology=lte&fromMhz=700&toMhz=700', 'engineer').expect(200)).body.map(
        (b: { designation: string }) => b.designation,
      );
      expect(at700.sort()).toEqual(['B12', 'B85']);
    });
  });

  describe('GET /api/bands/:id', () => {
    it('answers 401 without a token, 400 for a bad id and 404 for an unknown one', async () => {
      await call('get', '/api/bands/101').expect(401);
      expect((await call('get', '/api/bands/abc', 'engineer').expect(400)).body.fields[0].field).toBe('id');
      expect((await call('get', '/api/bands/999999', 'engineer').expect(404)).body.code).toBe('BAND_NOT_FOUND');
    });

    it.each(['procurement', 'engineer', 'admin'] as const)('returns a band for %s', async (role) => {
      const res = await call('get', '/api/bands/501', role).expect(200);
      expect(res.body).toMatchObject({ designation: 'GPS L1', duplex: 'receive-only', centreMhz: 1575.42 });
    });
  });

  describe('POST, PATCH, DELETE /api/bands', () => {
    it.each([
      ['post', '/api/bands'],
      ['patch', '/api/bands/101'],
      ['delete', '/api/bands/101'],
    ] as const)('%s %s: 401 anonymous, 403 for engineer and procurement', async (method, path) => {
      await call(method, path, undefined, newBand()).expect(401);
      expect((await call(method, path, 'engineer', newBand()).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      await call(method, path, 'procurement', newBand()).expect(403);
    });

    it('answers 400 naming the field for a range that ends below its start and for an unknown region', async () => {
      const bad = await call('post', '/api/bands', 'admin', { ...newBand(), ranges: [{ role: 'uplink', fromMhz: 900, toMhz: 800 }] }).expect(400);
      expect(bad.body.fields[0].field).toBe('ranges.0.toMhz');
      const role = await call('post', '/api/bands', 'admin', { ...newBand(), ranges: [{ role: 'sideways', fromMhz: 800, toMhz: 900 }] }).expect(400);
      expect(role.body.fields[0].field).toBe('ranges.0.role');
      const region = await call('post', '/api/bands', 'admin', { ...newBand(), regions: ['Atlantis'] }).expect(400);
      expect(region.body.fields[0].field).toBe('regions');
    });

    it('refuses a taken designation with 409 and a band in use with 409, changing nothing', async () => {
      expect((await call('post', '/api/bands', 'admin', { ...newBand(), designation: 'B3' }).expect(409)).body.code).toBe('BAND_DESIGNATION_TAKEN');
      expect((await call('delete', '/api/bands/103', 'admin').expect(409)).body.code).toBe('BAND_IN_USE');
      await call('get', '/api/bands/103', 'engineer').expect(200);
    });

    it('creates, corrects and deletes a band, each with an audit entry', async () => {
      const input = newBand();
      const created = await call('post', '/api/bands', 'admin', input).expect(201);
      expect(created.body).toMatchObject({
        designation: input.designation,
        ranges: input.ranges,
        source: { document: 'ERC/REC 70-03', table: 'Annex 1', note: 'test data' },
      });
      const id = created.body.id;
      const patched = await call('patch', `/api/bands/${id}`, 'admin', { ranges: [{ role: 'transmit-receive', fromMhz: 433.05, toMhz: 434.8 }] }).expect(200);
      expect(patched.body.ranges).toEqual([{ role: 'transmit-receive', fromMhz: 433.05, toMhz: 434.8 }]);
      await call('delete', `/api/bands/${id}`, 'admin').expect(204);
      await call('get', `/api/bands/${id}`, 'admin').expect(404);
      const actions = (await auditOf('band', id)).map((e) => e.action);
      expect(actions).toEqual(['deleted', 'updated', 'created']);
    });
  });

  describe('GET /api/band-sets', () => {
    it('answers 401 without a token', async () => {
      await call('get', '/api/band-sets').expect(401);
      await call('get', '/api/band-sets/1').expect(401);
    });

    it.each(['procurement', 'engineer', 'admin'] as const)('lists the seeded sets for %s, each saying lists must be checked', async (role) => {
      const res = await call('get', '/api/band-sets', role).expect(200);
      const europe = res.body.find((s: { id: number }) => s.id === 1);
      expect(europe).toMatchObject({ name: 'LTE-M Europe (example)', bandIds: [103, 108, 120] });
      expect(europe.bands.map((b: { designation: string }) => b.designation)).toEqual(['B3', 'B8', 'B20']);
      for (const id of [1, 2, 3]) expect(res.body.find((s: { id: number }) => s.id === id).description).toMatch(/vary.*check/i);
    });

    it('returns one set and 404 for an unknown one', async () => {
      expect((await call('get', '/api/band-sets/2', 'procurement').expect(200)).body.bands.map((b: { designation: string }) => b.designation)).toEqual([
        'B2',
        'B4',
        'B5',
        'B12',
        'B13',
        'B66',
      ]);
      expect((await call('get', '/api/band-sets/999999', 'procurement').expect(404)).body.code).toBe('BAND_SET_NOT_FOUND');
    });
  });

  describe('POST, PATCH, DELETE /api/band-sets', () => {
    const body = () => ({ name: unique('Set'), description: 'Test set; operators vary, check them.', bandIds: [103, 120] });

    it.each([
      ['post', '/api/band-sets'],
      ['patch', '/api/band-sets/1'],
      ['delete', '/api/band-sets/1'],
    ] as const)('%s %s: 401 anonymous, 403 for engineer and procurement', async (method, path) => {
      await call(method, path, undefined, body()).expect(401);
      expect((await call(method, path, 'engineer', body()).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      await call(method, path, 'procurement', body()).expect(403);
    });

    it('answers 400 naming the band for unknown and repeated band ids, and 409 for a taken name', async () => {
      const unknown = await call('post', '/api/band-sets', 'admin', { ...body(), bandIds: [103, 999999] }).expect(400);
      expect(unknown.body.fields).toEqual([{ field: 'bandIds.1', message: expect.stringContaining('999999') }]);
      const twice = await call('post', '/api/band-sets', 'admin', { ...body(), bandIds: [103, 103] }).expect(400);
      expect(twice.body.fields[0].field).toBe('bandIds.1');
      const empty = await call('post', '/api/band-sets', 'admin', { ...body(), bandIds: [] }).expect(400);
      expect(empty.body.fields[0].field).toBe('bandIds');
      const taken = await call('post', '/api/band-sets', 'admin', { ...body(), name: 'LTE-M Europe (example)' }).expect(409);
      expect(taken.body.code).toBe('BAND_SET_NAME_TAKEN');
    });

    it('creates, edits and deletes a set with audit entries; a rejected edit changes nothing', async () => {
      const input = body();
      const created = await call('post', '/api/band-sets', 'admin', input).expect(201);
      const id = created.body.id;
      expect(created.body.bandIds).toEqual([103, 120]);
      await call('patch', `/api/band-sets/${id}`, 'admin', { version: 1, bandIds: [103, 999999] }).expect(400);
      expect((await call('get', `/api/band-sets/${id}`, 'admin').expect(200)).body.bandIds).toEqual([103, 120]);
      const edited = await call('patch', `/api/band-sets/${id}`, 'admin', { version: 1, bandIds: [108, 103], description: 'Changed' }).expect(200);
      expect(edited.body).toMatchObject({ bandIds: [108, 103], description: 'Changed', version: 2 });
      await call('delete', `/api/band-sets/${id}`, 'admin').expect(204);
      await call('get', `/api/band-sets/${id}`, 'admin').expect(404);
      const audit = await auditOf('band-set', id);
      expect(audit.map((e) => e.action)).toEqual(['deleted', 'updated', 'created']);
      expect(audit[1].changes.bandIds).toEqual([
        [103, 120],
        [108, 103],
      ]);
      expect(audit[1].user?.email).toBe('admin@bandwright.test');
    });
  });

  describe('GET /api/regulatory-limits', () => {
    it('answers 401 without a token', async () => {
      await call('get', '/api/regulatory-limits').expect(401);
      await call('get', '/api/regulatory-limits/1').expect(401);
    });

    it.each(['procurement', 'engineer', 'admin'] as const)('lists the seeded limits for %s', async (role) => {
      const res = await call('get', '/api/regulatory-limits', role).expect(200);
      // 47 CFR 15.247(b)(3), (b)(4): 1 W conducted, reduced dB for dB above 6 dBi.
      expect(res.body.find((l: { id: number }) => l.id === 2)).toMatchObject({
        region: 'US',
        fromMhz: 2400,
        toMhz: 2483.5,
        kind: 'conducted-gain-rule',
        valueDbm: 30,
        gainThresholdDbi: 6,
        reductionDbPerDb: 1,
      });
      // ETSI EN 300 328 (from memory): 20 dBm e.i.r.p.
      expect(res.body.find((l: { id: number }) => l.id === 4)).toMatchObject({
        region: 'EU',
        kind: 'eirp',
        valueDbm: 20,
        note: expect.stringMatching(/from memory/i),
      });
    });

    it('keeps 868 MHz limits as unrounded ERP in dBm', async () => {
      const res = await call('get', '/api/regulatory-limits?region=EU&fromMhz=869.4&toMhz=869.65', 'engineer').expect(200);
      const high = res.body.find((l: { id: number }) => l.id === 9);
      // EU 2017/1483 via CNAF UN-39: 500 mW e.r.p. = 10·log10(500) = 26.99 dBm (ERP vs EIRP: ITU RR Art. 1).
      expect(high).toMatchObject({ kind: 'erp', valueText: '500 mW e.r.p.' });
      expect(high.valueDbm).toBeCloseTo(26.9897, 4);
      const low = (await call('get', '/api/regulatory-limits/7', 'engineer').expect(200)).body;
      // 25 mW = 13.979 dBm, not 14 (10·log10(25); keep unrounded values, common practice).
      expect(low.valueDbm).toBeCloseTo(13.9794, 4);
      expect(low.valueDbm).not.toBe(14);
    });

    it('answers 400 for a bad region filter and 404 for an unknown id', async () => {
      expect((await call('get', '/api/regulatory-limits?region=Mars', 'engineer').expect(400)).body.fields[0].field).toBe('region');
      expect((await call('get', '/api/regulatory-limits/999999', 'engineer').expect(404)).body.code).toBe('REGULATORY_LIMIT_NOT_FOUND');
    });
  });

  describe('POST, PATCH, DELETE /api/regulatory-limits', () => {
    const body = () => ({
      region: 'EU',
      technologies: ['ism', 'other'],
      title: unique('Test limit'),
      fromMhz: 433.05,
      toMhz: 434.79,
      kind: 'erp',
      valueDbm: 10,
      valueText: '10 mW e.r.p.',
      source: 'ERC/REC 70-03 Annex 1 (test)',
    });

    it.each([
      ['post', '/api/regulatory-limits'],
      ['patch', '/api/regulatory-limits/1'],
      ['delete', '/api/regulatory-limits/1'],
    ] as const)('%s %s: 401 anonymous, 403 for engineer and procurement', async (method, path) => {
      await call(method, path, undefined, body()).expect(401);
      expect((await call(method, path, 'engineer', body()).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      await call(method, path, 'procurement', body()).expect(403);
    });

    it('answers 400 naming the field for cross-field mistakes', async () => {
      const noRule = await call('post', '/api/regulatory-limits', 'admin', { ...body(), kind: 'conducted-gain-rule' }).expect(400);
      expect(noRule.body.fields.map((f: { field: string }) => f.field)).toEqual(['gainThresholdDbi', 'reductionDbPerDb']);
      const strayRule = await call('post', '/api/regulatory-limits', 'admin', { ...body(), gainThresholdDbi: 6 }).expect(400);
      expect(strayRule.body.fields[0].field).toBe('gainThresholdDbi');
      const reversed = await call('post', '/api/regulatory-limits', 'admin', { ...body(), toMhz: 433 }).expect(400);
      expect(reversed.body.fields[0].field).toBe('toMhz');
      const kind = await call('post', '/api/regulatory-limits', 'admin', { ...body(), kind: 'loudness' }).expect(400);
      expect(kind.body.fields[0].field).toBe('kind');
    });

    it('creates, edits and deletes a limit with audit entries; a rejected edit changes nothing', async () => {
      const created = await call('post', '/api/regulatory-limits', 'admin', body()).expect(201);
      const id = created.body.id;
      await call('patch', `/api/regulatory-limits/${id}`, 'admin', { kind: 'conducted-gain-rule' }).expect(400);
      expect((await call('get', `/api/regulatory-limits/${id}`, 'admin').expect(200)).body.kind).toBe('erp');
      const edited = await call('patch', `/api/regulatory-limits/${id}`, 'admin', { valueDbm: 7.85, valueText: '6.1 mW e.r.p.' }).expect(200);
      expect(edited.body.valueDbm).toBe(7.85);
      await call('delete', `/api/regulatory-limits/${id}`, 'admin').expect(204);
      const audit = await auditOf('regulatory-limit', id);
      expect(audit.map((e) => e.action)).toEqual(['deleted', 'updated', 'created']);
      expect(audit[1].changes.valueDbm).toEqual([10, 7.85]);
    });
  });

  describe('exported services', () => {
    it('RegulatoryLimitsService.findApplicable returns the limits of a region that overlap a band', async () => {
      const limits = app.get(RegulatoryLimitsService);
      // LoRa EU868 default channels 868.1–868.5 MHz sit in the 868.0–868.6 MHz sub-band (LoRa Alliance RP002-1.0.x; ERC/REC 70-03 Annex 1).
      const eu868 = await limits.findApplicable('EU', 868.0, 868.6);
      expect(eu868.map((l) => l.id)).toContain(7);
      expect(eu868.map((l) => l.id)).not.toContain(9);
      // BLE 2400–2483.5 MHz in the US falls under 15.247 (id 2), not the EU rule.
      const us24 = await limits.findApplicable('US', 2400, 2483.5);
      expect(us24.map((l) => l.id)).toContain(2);
      expect(us24.every((l) => l.region === 'US' || l.region === 'global')).toBe(true);
    });

    it('BandsService.findByIds returns bands with ranges and skips unknown ids', async () => {
      const bands = await app.get(BandsService).findByIds([120, 999999, 501]);
      expect(bands.map((b) => b.designation)).toEqual(['B20', 'GPS L1']);
      // 3GPP TS 36.101 Table 5.5-1: band 20 UL 832–862, DL 791–821 MHz (uplink above downlink).
      expect(bands[0].ranges).toEqual([
        { role: 'uplink', fromMhz: 832, toMhz: 862 },
        { role: 'downlink', fromMhz: 791, toMhz: 821 },
      ]);
    });
  });
});
