import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, unique } from '../support/api-app';

// Demo data (catalog-seed/products.json, parts/parts.json, assignments.json): stable ids.
const TRACKER = 1;
const GATEWAY = 2;
const TRACKER_BLE = 13;
const TRACKER_GNSS = 12;
const LOW_EFFICIENCY_CHIP = 1029;
const GOOD_BLE_CHIP = 1025;
const LINEAR_GNSS_CHIP = 1019;

interface Cell {
  row: number;
  column: number;
  status: string;
  findings: { ruleId: string; severity: string; code: string; message: string }[];
}
interface Matrix {
  rows: { radioId: number; bandId: number; designation: string; ranges: unknown[] }[];
  columns: { partId: number; mpn: string; title: string; assignments: { radioId: number }[] }[];
  cells: Cell[];
}

function cellsOf(matrix: Matrix, radioId: number, partId: number): Cell[] {
  const column = matrix.columns.findIndex((c) => c.partId === partId);
  return matrix.cells.filter((c) => c.column === column && matrix.rows[c.row].radioId === radioId);
}

/** A rule that can never fire on real data, so creating it leaves everyone's matrices alone. */
function inertRule(id: string, overrides: Record<string, unknown> = {}) {
  return {
    id,
    title: `Test rule ${id}`,
    description: 'made by the e2e tests',
    severity: 'marginal',
    enabled: true,
    version: 1,
    source: 'test',
    parameters: { designationNever: `never-${id}` },
    conditions: { all: [{ fact: 'designation', operator: 'equal', value: { param: 'designationNever' } }] },
    event: { type: 'finding', params: { code: 'TEST_RULE', message: 'never {designation}' } },
    ...overrides,
  };
}

describe('compatibility (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  /** A product of our own with one BLE radio, so assignment tests never touch the demo products. */
  async function ownBleProduct(): Promise<{ productId: number; radioId: number }> {
    const bands = await http().get('/api/bands').query({ designation: 'BLE 2.4 GHz' }).set(as('engineer')).expect(200);
    const product = await http()
      .post('/api/products')
      .set(as('engineer'))
      .send({
        name: unique('matrix test'),
        code: unique('MT').slice(0, 40),
        owner: 'e2e',
        groundPlaneLengthMm: 62,
        groundPlaneWidthMm: 28,
        targetRegions: ['EU', 'US'],
      })
      .expect(201);
    const radio = await http()
      .post(`/api/products/${product.body.id}/radios`)
      .set(as('engineer'))
      .send({
        name: 'BLE',
        technology: 'ble',
        module: 'test module',
        transmitPowerDbm: 8,
        polarization: 'linear',
        connector: 'solder-pad',
        feedLossDb: 0.2,
        bands: [{ bandId: bands.body[0].id, certifiedMaxGainDbi: 2.5 }],
      })
      .expect(201);
    return { productId: product.body.id, radioId: radio.body.id };
  }

  describe('GET /api/products/:id/matrix', () => {
    it('answers 401 without a token', async () => {
      await http().get(`/api/products/${TRACKER}/matrix`).expect(401);
    });

    it('lets every role read it', async () => {
      for (const role of ['procurement', 'engineer', 'admin'] as const) await http().get(`/api/products/${TRACKER}/matrix`).set(as(role)).expect(200);
    });

    it('answers 400 naming "parts" for a malformed list, 404 for an unknown product or part', async () => {
      const bad = await http().get(`/api/products/${TRACKER}/matrix`).query({ parts: '12,abc' }).set(as('engineer')).expect(400);
      expect(bad.body.fields[0].field).toBe('parts');
      expect((await http().get('/api/products/999999/matrix').set(as('engineer')).expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
      const part = await http().get(`/api/products/${TRACKER}/matrix`).query({ parts: '999999' }).set(as('engineer')).expect(404);
      expect(part.body.code).toBe('PART_NOT_FOUND');
    });

    it('shows the demo tracker: rows per radio band, its assigned parts as columns, and a failing BLE cell with the numbers', async () => {
      const res = await http().get(`/api/products/${TRACKER}/matrix`).set(as('engineer')).expect(200);
      const matrix: Matrix = res.body;
      expect(matrix.rows.map((r) => r.designation)).toEqual(expect.arrayContaining(['B12', 'GPS L1', 'BLE 2.4 GHz']));
      expect(matrix.columns.map((c) => c.partId)).toEqual(expect.arrayContaining([1001, LINEAR_GNSS_CHIP, LOW_EFFICIENCY_CHIP]));
      // Each radio's rows against that radio's own parts only.
      expect(matrix.cells).toHaveLength(
        matrix.rows.reduce((n, row) => n + matrix.columns.filter((c) => c.assignments.some((a) => a.radioId === row.radioId)).length, 0),
      );
      const [ble] = cellsOf(matrix, TRACKER_BLE, LOW_EFFICIENCY_CHIP);
      expect(ble.status).toBe('fail');
      const floor = ble.findings.find((f) => f.code === 'EFFICIENCY_BELOW_FLOOR')!;
      expect(floor.message).toMatch(
        /^efficiency at the radio port falls to [\d.]+ % at [\d.]+ MHz \(antenna total efficiency [\d.]+ %, feed loss [\d.]+ dB\); the floor for ble is 30 %$/,
      );
      // The linear GNSS chip costs about 3 dB on the RHCP signal (Balanis §2.12): marginal on every GNSS band.
      const gnss = cellsOf(matrix, TRACKER_GNSS, LINEAR_GNSS_CHIP);
      expect(gnss.length).toBeGreaterThan(0);
      for (const cell of gnss) {
        expect(cell.findings.map((f) => f.code)).toContain('POLARIZATION_LOSS');
        expect(['marginal', 'fail']).toContain(cell.status);
      }
    });

    it('shows the expected mix of states over the demo products, and no data for a part without measurements', async () => {
      const draft = await http()
        .post('/api/parts')
        .set(as('engineer'))
        .send({
          manufacturer: 'E2E Test Antennas',
          mpn: unique('ND'),
          title: 'draft part with no data',
          formFactor: 'chip',
          connector: 'solder-pad',
          polarization: 'linear',
        })
        .expect(201);
      const statuses = new Set<string>();
      for (const product of [TRACKER, GATEWAY]) {
        const matrix: Matrix = (await http().get(`/api/products/${product}/matrix`).set(as('engineer')).expect(200)).body;
        for (const cell of matrix.cells) statuses.add(cell.status);
      }
      expect([...statuses]).toEqual(expect.arrayContaining(['pass', 'marginal', 'fail']));
      const noData: Matrix = (
        await http()
          .get(`/api/products/${TRACKER}/matrix`)
          .query({ parts: String(draft.body.id) })
          .set(as('engineer'))
          .expect(200)
      ).body;
      expect(noData.cells.every((c) => c.status === 'no-data')).toBe(true);
      expect(noData.cells[0].findings.find((f) => f.code === 'BAND_NOT_COVERED_NO_DATA')!.message).toContain('S11/VSWR');
    });
  });

  describe('GET /api/products/:id/radios/:radioId/candidates', () => {
    it('answers 401 without a token and 404 for a radio of another product', async () => {
      await http().get(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/candidates`).expect(401);
      expect((await http().get(`/api/products/${GATEWAY}/radios/${TRACKER_BLE}/candidates`).set(as('engineer')).expect(404)).body.code).toBe('RADIO_NOT_FOUND');
      await http().get(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/candidates`).query({ limit: 0 }).set(as('engineer')).expect(400);
    });

    it('ranks approved parts for the tracker BLE radio: passes first, by fit, then by margin, each with its deciding figure', async () => {
      const res = await http().get(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/candidates`).query({ limit: 200 }).set(as('procurement')).expect(200);
      const candidates: {
        partId: number;
        status: string;
        fit: { rank: number };
        marginDb: number | null;
        deciding: { text: string } | null;
        assignment: string | null;
      }[] = res.body.candidates;
      const order = { pass: 0, marginal: 1, 'no-data': 2, fail: 3 } as Record<string, number>;
      for (let i = 1; i < candidates.length; i++) expect(order[candidates[i].status]).toBeGreaterThanOrEqual(order[candidates[i - 1].status]);
      const passes = candidates.filter((c) => c.status === 'pass');
      for (let i = 1; i < passes.length; i++) {
        expect(passes[i].fit.rank).toBeGreaterThanOrEqual(passes[i - 1].fit.rank);
        if (passes[i].fit.rank === passes[i - 1].fit.rank) expect(passes[i].marginDb ?? -Infinity).toBeLessThanOrEqual(passes[i - 1].marginDb ?? Infinity);
      }
      const good = candidates.find((c) => c.partId === GOOD_BLE_CHIP)!;
      expect(good.status).toBe('pass');
      expect(good.deciding!.text).toMatch(/dB inside\)$/);
      expect(candidates.find((c) => c.partId === LOW_EFFICIENCY_CHIP)).toMatchObject({ status: 'fail', assignment: 'chosen' });
    });
  });

  describe('figures that mean what they say', () => {
    /** A product of our own with one LTE radio on band 8 behind `feedLossDb` of cable. */
    async function ownB8Product(feedLossDb: number): Promise<number> {
      const bands = await http().get('/api/bands').query({ designation: 'B8' }).set(as('engineer')).expect(200);
      const product = await http()
        .post('/api/products')
        .set(as('engineer'))
        .send({
          name: unique('basis test'),
          code: unique('BT').slice(0, 40),
          owner: 'e2e',
          groundPlaneLengthMm: 120,
          groundPlaneWidthMm: 60,
          targetRegions: ['EU'],
        })
        .expect(201);
      await http()
        .post(`/api/products/${product.body.id}/radios`)
        .set(as('engineer'))
        .send({
          name: 'LTE',
          technology: 'lte',
          module: 'test module',
          transmitPowerDbm: 23,
          polarization: 'linear',
          connector: 'SMA',
          feedLossDb,
          bands: [{ bandId: bands.body[0].id, certifiedMaxGainDbi: 5 }],
        })
        .expect(201);
      return product.body.id;
    }
    const draft = async (specBands: Record<string, unknown>[]) =>
      (
        await http()
          .post('/api/parts')
          .set(as('engineer'))
          .send({
            manufacturer: 'Testbench Antennas',
            mpn: unique('BASIS'),
            title: 'basis test part',
            formFactor: 'chip',
            connector: 'SMA',
            polarization: 'linear',
            specBands,
          })
          .expect(201)
      ).body as { id: number; mpn: string };
    const findingCodes = async (productId: number, partId: number) => {
      const matrix: Matrix = (
        await http()
          .get(`/api/products/${productId}/matrix`)
          .query({ parts: String(partId) })
          .set(as('engineer'))
          .expect(200)
      ).body;
      return matrix.cells.flatMap((c) => c.findings);
    };

    it('search and matrix agree on a part that covers both B8 ranges but not the duplex gap between them', async () => {
      // 3GPP TS 36.101 Table 5.5-1: band 8 UL 880–915 MHz, DL 925–960 MHz.
      const part = await draft([
        { fromMhz: 880, toMhz: 915, maxVswr: 2, efficiencyPct: 50, efficiencyBasis: 'total' },
        { fromMhz: 925, toMhz: 960, maxVswr: 2, efficiencyPct: 50, efficiencyBasis: 'total' },
      ]);
      const found = await http().get('/api/parts').query({ q: part.mpn, covers: '880-915,925-960', minEfficiencyPct: 50 }).set(as('engineer')).expect(200);
      expect(found.body.total).toBe(1);
      const findings = await findingCodes(await ownB8Product(0), part.id);
      const codes = findings.map((f) => f.code);
      expect(codes).not.toContain('BAND_NOT_COVERED');
      expect(codes).not.toContain('VSWR_ABOVE_TARGET');
      expect(codes).not.toContain('EFFICIENCY_BELOW_FLOOR');
    });

    it('judges the efficiency floor at the radio port: 21 % total behind 1.5 dB of cable is 14.87 %, under the 15 % LTE floor', async () => {
      // System efficiency = total × 10^(−L/10) = 21 % × 0.70795 = 14.867 % (definition); floor 15 % for LTE (common practice).
      const part = await draft([{ fromMhz: 870, toMhz: 970, maxVswr: 1.5, efficiencyPct: 21, efficiencyBasis: 'total', efficiencyStatistic: 'minimum' }]);
      const fed = (await findingCodes(await ownB8Product(1.5), part.id)).find((f) => f.code === 'EFFICIENCY_BELOW_FLOOR');
      expect(fed).toMatchObject({ severity: 'fail' });
      expect(fed!.message).toMatch(/^efficiency at the radio port falls to 14\.87 % at [\d.]+ MHz \(antenna total efficiency 21 %, feed loss 1\.5 dB\)/);
      const direct = await findingCodes(await ownB8Product(0), part.id);
      expect(direct.map((f) => f.code)).not.toContain('EFFICIENCY_BELOW_FLOOR');
    });
  });

  describe('assignments', () => {
    it('answers 401 without a token and 403 for procurement on every change', async () => {
      await http().post(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/shortlist`).send({ partId: GOOD_BLE_CHIP }).expect(401);
      await http().post(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/shortlist`).set(as('procurement')).send({ partId: GOOD_BLE_CHIP }).expect(403);
      await http().put(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/choice`).set(as('procurement')).send({ partId: GOOD_BLE_CHIP }).expect(403);
      await http().delete(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/choice`).set(as('procurement')).expect(403);
      await http().delete(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/shortlist/${LOW_EFFICIENCY_CHIP}`).set(as('procurement')).expect(403);
    });

    it('answers 400 for a bad body and 404 for an unknown part or a radio of another product', async () => {
      const { productId, radioId } = await ownBleProduct();
      expect(
        (await http().post(`/api/products/${productId}/radios/${radioId}/shortlist`).set(as('engineer')).send({ partId: 'x' }).expect(400)).body.fields[0]
          .field,
      ).toBe('partId');
      expect(
        (await http().post(`/api/products/${productId}/radios/${radioId}/shortlist`).set(as('engineer')).send({ partId: 999999 }).expect(404)).body.code,
      ).toBe('PART_NOT_FOUND');
      await http().put(`/api/products/${productId}/radios/${TRACKER_BLE}/choice`).set(as('engineer')).send({ partId: GOOD_BLE_CHIP }).expect(404);
      const assignments = await http().get(`/api/products/${productId}/assignments`).set(as('engineer')).expect(200);
      expect(assignments.body).toEqual([]);
    });

    it('shortlists, chooses one part per radio (the old choice returns to the shortlist), and the row turns to pass', async () => {
      const { productId, radioId } = await ownBleProduct();
      await http().post(`/api/products/${productId}/radios/${radioId}/shortlist`).set(as('engineer')).send({ partId: LOW_EFFICIENCY_CHIP }).expect(201);
      await http().put(`/api/products/${productId}/radios/${radioId}/choice`).set(as('engineer')).send({ partId: LOW_EFFICIENCY_CHIP }).expect(200);
      let matrix: Matrix = (await http().get(`/api/products/${productId}/matrix`).set(as('engineer')).expect(200)).body;
      expect(cellsOf(matrix, radioId, LOW_EFFICIENCY_CHIP)[0].status).toBe('fail');

      const chosen = await http().put(`/api/products/${productId}/radios/${radioId}/choice`).set(as('admin')).send({ partId: GOOD_BLE_CHIP }).expect(200);
      expect(chosen.body.map((a: { partId: number; state: string }) => [a.partId, a.state]).sort()).toEqual(
        [
          [LOW_EFFICIENCY_CHIP, 'shortlisted'],
          [GOOD_BLE_CHIP, 'chosen'],
        ].sort(),
      );
      matrix = (await http().get(`/api/products/${productId}/matrix`).set(as('engineer')).expect(200)).body;
      expect(matrix.columns[0].partId).toBe(GOOD_BLE_CHIP);
      expect(cellsOf(matrix, radioId, GOOD_BLE_CHIP).map((c) => c.status)).toEqual(['pass']);

      await http().delete(`/api/products/${productId}/radios/${radioId}/choice`).set(as('engineer')).expect(200);
      expect((await http().delete(`/api/products/${productId}/radios/${radioId}/choice`).set(as('engineer')).expect(404)).body.code).toBe(
        'ASSIGNMENT_NOT_FOUND',
      );
      const removed = await http().delete(`/api/products/${productId}/radios/${radioId}/shortlist/${LOW_EFFICIENCY_CHIP}`).set(as('engineer')).expect(200);
      expect(removed.body.map((a: { partId: number }) => a.partId)).toEqual([GOOD_BLE_CHIP]);

      const history = await http().get(`/api/products/${productId}/assignments/history`).set(as('procurement')).expect(200);
      expect(history.body.items.map((e: { action: string }) => e.action)).toEqual(['removed', 'unchosen', 'chosen', 'chosen', 'shortlisted']);
      expect(history.body.items[2].changes).toEqual({ radioId, partId: [LOW_EFFICIENCY_CHIP, GOOD_BLE_CHIP] });
    });
  });

  describe('rules', () => {
    it('answers 401 without a token; procurement may not read, engineers read but do not change', async () => {
      await http().get('/api/rules').expect(401);
      await http().get('/api/rules').set(as('procurement')).expect(403);
      const list = await http().get('/api/rules').set(as('engineer')).expect(200);
      expect(list.body.map((r: { id: string }) => r.id)).toEqual(
        expect.arrayContaining(['band-coverage', 'vswr-in-band', 'efficiency-floor', 'regional-power-limit', 'gnss-polarization', 'part-end-of-life']),
      );
      await http().get('/api/rules/vswr-in-band').set(as('engineer')).expect(200);
      await http()
        .post('/api/rules')
        .set(as('engineer'))
        .send({ definition: inertRule(unique('e2e')) })
        .expect(403);
      await http().put('/api/rules/vswr-in-band').set(as('engineer')).send({ definition: {}, version: 1 }).expect(403);
      await http().put('/api/rules/vswr-in-band/enabled').set(as('engineer')).send({ enabled: false, version: 1 }).expect(403);
      await http().post('/api/rules/validation').set(as('engineer')).send({ definition: {} }).expect(403);
      await http().post('/api/rules/preview').set(as('engineer')).send({ definition: {} }).expect(403);
    });

    it('validates without saving and names an unknown fact with its place', async () => {
      const res = await http()
        .post('/api/rules/validation')
        .set(as('admin'))
        .send({ definition: inertRule('e2e-probe', { conditions: { all: [{ fact: 'efficiencyPercentage', operator: 'lessThan', value: 40 }] } }) })
        .expect(200);
      expect(res.body).toEqual({ valid: false, problems: [{ path: 'conditions.all[0].fact', message: 'unknown fact "efficiencyPercentage"' }] });
      expect(
        (
          await http()
            .post('/api/rules/validation')
            .set(as('admin'))
            .send({ definition: inertRule('e2e-probe') })
            .expect(200)
        ).body.valid,
      ).toBe(true);
    });

    it('creates, edits with validation before saving, refuses stale versions, disables, and keeps the history', async () => {
      const id = unique('e2e-rule').toLowerCase();
      const created = await http()
        .post('/api/rules')
        .set(as('admin'))
        .send({ definition: inertRule(id) })
        .expect(201);
      expect(created.body).toMatchObject({ id, version: 1, origin: 'admin', enabled: true });
      expect(
        (
          await http()
            .post('/api/rules')
            .set(as('admin'))
            .send({ definition: inertRule(id) })
            .expect(409)
        ).body.code,
      ).toBe('RULE_ID_TAKEN');
      expect(
        (
          await http()
            .post('/api/rules')
            .set(as('admin'))
            .send({ definition: inertRule('vswr-in-band') })
            .expect(409)
        ).body.code,
      ).toBe('RULE_ID_TAKEN');

      const bad = await http()
        .put(`/api/rules/${id}`)
        .set(as('admin'))
        .send({ version: 1, definition: inertRule(id, { conditions: { all: [{ fact: 'worstVswr', operator: 'greaterThan', value: { param: 'maxVswr' } }] } }) })
        .expect(400);
      expect(bad.body.code).toBe('VALIDATION_FAILED');
      expect(bad.body.fields).toEqual([{ field: 'definition.conditions.all[0].value.param', message: 'unknown parameter "maxVswr"' }]);
      expect((await http().get(`/api/rules/${id}`).set(as('admin')).expect(200)).body.version).toBe(1);

      const edited = await http()
        .put(`/api/rules/${id}`)
        .set(as('admin'))
        .send({ version: 1, definition: inertRule(id, { title: 'edited title' }) })
        .expect(200);
      expect(edited.body).toMatchObject({ version: 2, title: 'edited title' });
      expect(
        (
          await http()
            .put(`/api/rules/${id}`)
            .set(as('admin'))
            .send({ version: 1, definition: inertRule(id) })
            .expect(409)
        ).body.code,
      ).toBe('RULE_VERSION_CONFLICT');
      const renamed = await http()
        .put(`/api/rules/${id}`)
        .set(as('admin'))
        .send({ version: 2, definition: inertRule('another-id') })
        .expect(400);
      expect(renamed.body.fields[0].field).toBe('definition.id');

      const disabled = await http().put(`/api/rules/${id}/enabled`).set(as('admin')).send({ enabled: false, version: 2 }).expect(200);
      expect(disabled.body).toMatchObject({ enabled: false, version: 3 });
      const versions = await http().get(`/api/rules/${id}/versions`).set(as('engineer')).expect(200);
      expect(versions.body.map((v: { version: number; action: string }) => [v.version, v.action])).toEqual([
        [3, 'disabled'],
        [2, 'edited'],
        [1, 'created'],
      ]);
      await http().get('/api/rules/not-a-rule-at-all').set(as('admin')).expect(404);
      await http().get('/api/rules/Bad_Id').set(as('admin')).expect(400);
    });

    it('previews which demo cells a rule would change, without saving it', async () => {
      const id = unique('e2e-preview').toLowerCase();
      // "End of life" for every active part: every pass or marginal cell of the demo matrices would fail.
      const sweeping = inertRule(id, {
        severity: 'fail',
        parameters: { active: 'active' },
        conditions: { all: [{ fact: 'lifecycle', operator: 'equal', value: { param: 'active' } }] },
        event: { type: 'finding', params: { code: 'TEST_SWEEP', message: 'lifecycle {lifecycle}' } },
      });
      const res = await http().post('/api/rules/preview').set(as('admin')).send({ definition: sweeping }).expect(200);
      expect(res.body.ruleId).toBe(id);
      const tracker = res.body.changes.filter((c: { productId: number }) => c.productId === TRACKER);
      expect(tracker.length).toBeGreaterThan(0);
      for (const change of res.body.changes) {
        expect(change.after).toBe('fail');
        expect(change.before).not.toBe('fail');
        expect(change.findings).toEqual(['lifecycle active']);
      }
      expect(tracker).toContainEqual(expect.objectContaining({ radioId: TRACKER_GNSS, partId: LINEAR_GNSS_CHIP, before: 'marginal', after: 'fail' }));
      await http().get(`/api/rules/${id}`).set(as('admin')).expect(404);
      // An unsaved edit of an existing rule: VSWR target 1.01:1 makes passing cells marginal, and nothing is stored.
      const vswr = (await http().get('/api/rules/vswr-in-band').set(as('admin')).expect(200)).body;
      const strict = await http()
        .post('/api/rules/preview')
        .set(as('admin'))
        .send({ definition: { ...vswr.definition, parameters: { maxVswr: 1.01 } } })
        .expect(200);
      expect(strict.body.changes.length).toBeGreaterThan(0);
      for (const change of strict.body.changes) expect([change.before, change.after]).toEqual(['pass', 'marginal']);
      expect((await http().get('/api/rules/vswr-in-band').set(as('admin')).expect(200)).body.version).toBe(vswr.version);
      const invalid = await http()
        .post('/api/rules/preview')
        .set(as('admin'))
        .send({ definition: inertRule(id, { severity: 'warning' }) })
        .expect(400);
      expect(invalid.body.fields[0].field).toBe('definition.severity');
    });
  });
});
