import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { basisFields, createDraft, csvCurve, s1pWithGamma } from '../support/parts';

type Role = 'admin' | 'engineer' | 'procurement';

describe('catalogue search, coverage filter and CSV (API)', () => {
  let app: INestApplication;
  let tokens: Record<Role, string>;
  const http = () => request(app.getHttpServer());
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  // Every part of this file carries this manufacturer, so `q` isolates them from everyone else's.
  const maker = unique('Covertest');
  const ids: Record<string, number> = {};

  const upload = (id: number, kind: string, name: string, content: string) =>
    http()
      .post(`/api/parts/${id}/measurements`)
      .set(as('engineer'))
      .field({ kind, ...basisFields(kind) })
      .attach('file', Buffer.from(content), name)
      .expect(201);
  const search = async (query: Record<string, string | number>, role: Role = 'engineer') => {
    const res = await http()
      .get('/api/parts')
      .query({ q: maker, limit: 200, ...query })
      .set(as(role))
      .expect(200);
    return (res.body.items as { mpn: string }[]).map((i) => i.mpn.split(':')[0]).sort();
  };

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    const make = async (name: string, extra: Record<string, unknown> = {}) => {
      const part = await createDraft(app, tokens.engineer, { manufacturer: maker, mpn: `${name}:${unique('x')}`, ...extra });
      ids[name] = part.id;
      return part.id;
    };
    // |Γ| = 1/3 is VSWR 2 exactly (Pozar 4th ed. §2.3): worst point at 850 MHz.
    await upload(
      await make('at', { formFactor: 'flex' }),
      's11',
      'at.s1p',
      s1pWithGamma([
        [700, 0.6],
        [800, 0.2],
        [850, 1 / 3],
        [900, 0.2],
        [1000, 0.6],
        [1700, 0.2],
        [1900, 0.2],
      ]),
    );
    await upload(
      ids.at,
      'efficiency',
      'at.csv',
      csvCurve('frequency (MHz),efficiency (%)', [
        [700, 50],
        [850, 40],
        [1000, 50],
        [1700, 60],
        [1900, 60],
      ]),
    );
    // |Γ| 0.32 → VSWR 1.941 (just inside 2); |Γ| 0.34 → VSWR 2.030 (just outside).
    await upload(
      await make('inside', { connector: 'SMA' }),
      's11',
      'in.s1p',
      s1pWithGamma([
        [700, 0.6],
        [800, 0.2],
        [850, 0.32],
        [900, 0.2],
        [1000, 0.6],
      ]),
    );
    await upload(
      await make('outside'),
      's11',
      'out.s1p',
      s1pWithGamma([
        [700, 0.6],
        [800, 0.2],
        [850, 0.34],
        [900, 0.2],
        [1000, 0.6],
      ]),
    );
    // Samples inside the range are fine, but the interpolated edge at 800 MHz is |Γ| 0.35 → VSWR 2.08.
    await upload(
      await make('edge'),
      's11',
      'edge.s1p',
      s1pWithGamma([
        [780, 0.5],
        [820, 0.2],
        [900, 0.2],
        [1000, 0.5],
      ]),
    );
    // Datasheet-only parts: the spec bands decide.
    await make('spec', {
      specBands: [
        { fromMhz: 791, toMhz: 862, maxVswr: 2, efficiencyPct: 45 },
        { fromMhz: 862, toMhz: 960, maxVswr: 2.5, efficiencyPct: 50 },
      ],
    });
    // RL ≥ 10 dB is VSWR ≤ 1.925 (Pozar 4th ed. §2.3; a common confusion with VSWR 2).
    await make('rl10', { specBands: [{ fromMhz: 791, toMhz: 862, minReturnLossDb: 10 }] });
  });
  afterAll(() => app.close());

  describe('GET /api/parts', () => {
    it('answers 400 naming the field for a malformed coverage filter, a reversed range and stray limits', async () => {
      const bad = await http().get('/api/parts').query({ covers: '791-' }).set(as('engineer')).expect(400);
      expect(bad.body.fields[0].field).toBe('covers');
      const reversed = await http().get('/api/parts').query({ covers: '862-791' }).set(as('engineer')).expect(400);
      expect(reversed.body.message).toMatch(/range 1/);
      expect((await http().get('/api/parts').query({ vswrMax: 2 }).set(as('engineer')).expect(400)).body.fields[0].field).toBe('vswrMax');
      expect((await http().get('/api/parts').query({ status: 'approved,lost' }).set(as('engineer')).expect(400)).body.fields[0].field).toBe('status');
      expect((await http().get('/api/parts').query({ vswrMax: 0.5, covers: '800-900' }).set(as('engineer')).expect(400)).body.fields[0].field).toBe('vswrMax');
    });

    it('coverage at, just inside and just outside the VSWR limit, with interpolated band edges', async () => {
      expect(await search({ covers: '800-900' })).toEqual(['at', 'inside']);
      expect(await search({ covers: '800-900', vswrMax: 1.99 })).toEqual(['inside']);
      expect(await search({ covers: '800-900', vswrMax: 1.94 })).toEqual([]);
      expect(await search({ covers: '800-900', vswrMax: 2.04 })).toEqual(['at', 'inside', 'outside']);
      expect(await search({ covers: '800-900', vswrMax: 2.1 })).toEqual(['at', 'edge', 'inside', 'outside']);
      // The spec part needs its 2.5:1 band for 862–900 MHz.
      expect(await search({ covers: '800-900', vswrMax: 2.5 })).toEqual(['at', 'edge', 'inside', 'outside', 'spec']);
    });

    it('efficiency floor at and just above the minimum; a range outside the measured data is no data, never a pass', async () => {
      expect(await search({ covers: '800-900', minEfficiencyPct: 40 })).toEqual(['at']);
      expect(await search({ covers: '800-900', minEfficiencyPct: 40.01 })).toEqual([]);
      expect(await search({ covers: '650-900', vswrMax: 10 })).toEqual([]);
    });

    it('two ranges must both be met', async () => {
      expect(await search({ covers: '800-900,1700-1900' })).toEqual(['at']);
      expect(await search({ covers: '800-900,1700-1950' })).toEqual([]);
    });

    it('falls back to spec bands: union of bands, VSWR and efficiency limits, return loss converted to VSWR', async () => {
      expect(await search({ covers: '791-862', minEfficiencyPct: 45 })).toEqual(['spec']);
      expect(await search({ covers: '791-862', minEfficiencyPct: 46 })).toEqual([]);
      expect(await search({ covers: '800-900', vswrMax: 2.5, minEfficiencyPct: 45 })).toEqual(['spec']);
      expect(await search({ covers: '791-862', vswrMax: 1.93 })).toEqual(['rl10']);
      expect(await search({ covers: '791-862', vswrMax: 1.92 })).not.toContain('rl10');
    });

    it('procurement sees approved parts only unless it asks for other states; others see every state', async () => {
      expect(await search({}, 'procurement')).toEqual([]);
      expect(await search({ status: 'draft' }, 'procurement')).toHaveLength(6);
      await http().post(`/api/parts/${ids.at}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);
      await http().post(`/api/parts/${ids.at}/approval`).set(as('admin')).send({ version: 2 }).expect(200);
      expect(await search({}, 'procurement')).toEqual(['at']);
      expect(await search({ covers: '791-862', minEfficiencyPct: 40 }, 'procurement')).toEqual(['at']);
      expect(await search({})).toHaveLength(6);
      expect(await search({ status: 'draft' })).toHaveLength(5);
    });

    it('filters by form factor, connector and price ceiling; sorts and pages server-side', async () => {
      expect(await search({ formFactor: 'flex' })).toEqual(['at']);
      expect(await search({ connector: 'SMA,N' })).toEqual(['inside']);
      const offer = {
        supplier: 'Ferncastle Electronics Supply',
        currency: 'USD',
        priceBreaks: [
          { quantity: 1, unitPrice: '0.9000' },
          { quantity: 1000, unitPrice: '0.3800' },
        ],
      };
      await http().post(`/api/parts/${ids.inside}/offers`).set(as('procurement')).send(offer).expect(201);
      expect(await search({ priceMax: 0.38 })).toEqual(['inside']);
      expect(await search({ priceMax: 0.37 })).toEqual([]);
      expect(await search({ priceMax: 1, currency: 'EUR' })).toEqual([]);
      const page = await http().get('/api/parts').query({ q: maker, sort: 'mpn', order: 'desc', limit: 2, offset: 1 }).set(as('engineer')).expect(200);
      expect(page.body.total).toBe(6);
      expect(page.body.items.map((i: { mpn: string }) => i.mpn.split(':')[0])).toEqual(['rl10', 'outside']);
      const priced = await http().get('/api/parts').query({ q: maker, sort: 'price', limit: 1 }).set(as('engineer')).expect(200);
      expect(priced.body.items[0]).toMatchObject({ id: ids.inside, lowestPrices: [{ currency: 'USD', unitPrice: '0.3800' }] });
    });
  });

  describe('GET /api/parts/export', () => {
    it('exports the current search as CSV, one line per match', async () => {
      const res = await http()
        .get('/api/parts/export')
        .query({ q: maker, covers: '800-900' })
        .set(as('procurement'))
        .query({ status: 'approved,draft' })
        .expect(200);
      expect(res.headers['content-type']).toMatch(/text\/csv/);
      const lines = res.text.trim().split(/\r\n/);
      expect(lines[0].split(',').slice(0, 4)).toEqual(['id', 'manufacturer', 'mpn', 'title']);
      expect(lines).toHaveLength(3);
      expect(
        lines
          .slice(1)
          .map((l) => Number(l.split(',')[0]))
          .sort(),
      ).toEqual([ids.at, ids.inside].sort());
    });
  });

  describe('POST /api/parts/imports', () => {
    const header = 'manufacturer,mpn,title,formFactor,connector,polarization,lifecycle,evalGroundLengthMm,specBands';

    it('a dry run lists every problem by row and writes nothing; the real import then refuses it with 422', async () => {
      const mpn = unique('IMP');
      const csv = [
        header,
        `${maker},${mpn}-1,Good row,chip,solder-pad,linear,active,80,791-862 vswr=2 eff=45`,
        `${maker},${mpn}-2,Bad enum,wire,solder-pad,linear,active,,`,
        `${maker},,Missing mpn,chip,SMA,linear,active,abc,`,
        `${maker},${mpn}-1,Duplicate in file,chip,SMA,linear,active,,791-862 vswr=x`,
      ].join('\n');
      const dry = await http().post('/api/parts/imports').set(as('engineer')).attach('file', Buffer.from(csv), 'parts.csv').expect(200);
      expect(dry.body).toMatchObject({ dryRun: true, rowCount: 4, validRows: 1, createdIds: [] });
      expect(dry.body.problems.map((p: { row: number; field: string }) => `${p.row}:${p.field}`)).toEqual([
        '2:formFactor',
        '3:mpn',
        '3:evalGroundLengthMm',
        '4:specBands',
        '4:mpn',
      ]);
      expect(dry.body.problems[0].line).toBe(3);
      const real = await http()
        .post('/api/parts/imports')
        .query({ dryRun: 'false' })
        .set(as('engineer'))
        .attach('file', Buffer.from(csv), 'parts.csv')
        .expect(422);
      expect(real.body.code).toBe('PART_IMPORT_INVALID');
      expect(await search({ q: `${maker} ${mpn}` })).toEqual([]);
    });

    it('imports a clean file in one go as drafts, and refuses a re-import of the same MPNs', async () => {
      const mpn = unique('IMP');
      const csv = [
        header,
        `${maker},${mpn}-a,Imported A,chip,solder-pad,linear,active,80,791-862 vswr=2 eff=45; 880-960 vswr=2.5`,
        `${maker},${mpn}-b,Imported B,patch,solder-pad,RHCP,nrnd,,`,
      ].join('\n');
      const dry = await http().post('/api/parts/imports').set(as('engineer')).attach('file', Buffer.from(csv), 'parts.csv').expect(200);
      expect(dry.body.problems).toEqual([]);
      const res = await http()
        .post('/api/parts/imports')
        .query({ dryRun: 'false' })
        .set(as('engineer'))
        .attach('file', Buffer.from(csv), 'parts.csv')
        .expect(200);
      expect(res.body.createdIds).toHaveLength(2);
      const a = await http().get(`/api/parts/${res.body.createdIds[0]}`).set(as('engineer')).expect(200);
      expect(a.body).toMatchObject({
        reviewState: 'draft',
        evalGroundLengthMm: 80,
        specBands: [expect.objectContaining({ fromMhz: 791, maxVswr: 2, efficiencyPct: 45 }), expect.objectContaining({ fromMhz: 880, maxVswr: 2.5 })],
      });
      const again = await http().post('/api/parts/imports').set(as('engineer')).attach('file', Buffer.from(csv), 'parts.csv').expect(200);
      expect(again.body.problems.map((p: { row: number; field: string }) => `${p.row}:${p.field}`)).toEqual(['1:mpn', '2:mpn']);
    });
  });
});
