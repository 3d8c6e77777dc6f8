import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, unique } from '../support/api-app';

// Demo data (catalog-seed): the tracker, its BLE radio and a part chosen for it that fails the efficiency floor.
const TRACKER = 1;
const TRACKER_BLE = 13;
const LOW_EFFICIENCY_CHIP = 1029;

interface Finding {
  ruleId: string;
  severity: string;
  code: string;
  message: string;
}
interface Cell {
  row: number;
  column: number;
  status: string;
  findings: Finding[];
}

/** A sound rule that never fires on real data; each test breaks one part of it. */
function rule(id: string, overrides: Record<string, unknown> = {}) {
  return {
    id,
    title: `Safety rule ${id}`,
    description: 'made by the rule-safety e2e tests',
    severity: 'fail',
    enabled: true,
    version: 1,
    source: 'test',
    parameters: { states: ['never-a-state'], limit: 3 },
    conditions: { all: [{ fact: 'reviewState', operator: 'in', value: { param: 'states' } }] },
    event: { type: 'finding', params: { code: 'SAFETY_RULE', message: 'never {reviewState}' } },
    ...overrides,
  };
}
const leaf = (fact: string, operator: string, value: unknown) => ({ conditions: { all: [{ fact, operator, value }] } });

function nested(levels: number) {
  let node: unknown = { fact: 'worstVswr', operator: 'greaterThan', value: 2 };
  for (let i = 1; i < levels; i++) node = { all: [node] };
  return { conditions: node };
}

describe('rules can never break the matrix (API)', () => {
  let app: INestApplication;
  let db: DataSource;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createApiApp();
    db = app.get(DataSource);
    tokens = await demoTokens(app);
  }, 30_000);
  /** Ids these tests may have stored: removed at the end even when a refusal unexpectedly succeeded. */
  const ids: string[] = [];
  const newId = () => {
    const id = unique('safety').toLowerCase();
    ids.push(id);
    return id;
  };
  afterAll(async () => {
    if (ids.length > 0) {
      await db.query('DELETE FROM compatibility_rule_versions WHERE rule_key IN (?)', [ids]);
      await db.query('DELETE FROM compatibility_rules WHERE rule_key IN (?)', [ids]);
    }
    await app.close();
  });

  describe('POST /api/rules, PUT /api/rules/:id and POST /api/rules/preview', () => {
    const hostile: [string, Record<string, unknown>, string][] = [
      ['"in" with a parameter named constructor', leaf('reviewState', 'in', { param: 'constructor' }), 'definition.conditions.all[0].value.param'],
      ['"in" with a parameter named __proto__', leaf('reviewState', 'in', { param: '__proto__' }), 'definition.conditions.all[0].value.param'],
      ['"in" with a fact reference', leaf('reviewState', 'in', { fact: 'lifecycle' }), 'definition.conditions.all[0].value'],
      ['"in" with a number parameter', leaf('reviewState', 'in', { param: 'limit' }), 'definition.conditions.all[0].value.param'],
      ['"greaterThan" with a list parameter', leaf('worstVswr', 'greaterThan', { param: 'states' }), 'definition.conditions.all[0].value.param'],
      ['"lessThan" with text', leaf('worstVswr', 'lessThan', 'three'), 'definition.conditions.all[0].value'],
      [
        'a placeholder {toString}',
        { event: { type: 'finding', params: { code: 'SAFETY_RULE', message: 'see {toString}' } } },
        'definition.event.params.message',
      ],
      ['conditions nested 9 levels deep', nested(9), `definition.conditions${'.all[0]'.repeat(8)}`],
      [
        '201 conditions',
        { conditions: { any: Array.from({ length: 201 }, (_, i) => ({ fact: 'worstVswr', operator: 'greaterThan', value: i })) } },
        'definition.conditions.any[199]',
      ],
    ];

    it.each(hostile)('refuses %s with 400 naming the place, and stores nothing', async (_, change, field) => {
      const id = newId();
      const created = await http()
        .post('/api/rules')
        .set(as('admin'))
        .send({ definition: rule(id, change) })
        .expect(400);
      expect(created.body.code).toBe('VALIDATION_FAILED');
      expect(created.body.fields.map((f: { field: string }) => f.field)).toContain(field);
      await http().get(`/api/rules/${id}`).set(as('admin')).expect(404);
      const preview = await http()
        .post('/api/rules/preview')
        .set(as('admin'))
        .send({ definition: rule(id, change) })
        .expect(400);
      expect(preview.body.fields.map((f: { field: string }) => f.field)).toContain(field);
    });

    it('refuses an edit that would break a rule, keeping the saved version', async () => {
      const id = newId();
      await http()
        .post('/api/rules')
        .set(as('admin'))
        .send({ definition: rule(id) })
        .expect(201);
      const edit = await http()
        .put(`/api/rules/${id}`)
        .set(as('admin'))
        .send({ version: 1, definition: rule(id, leaf('reviewState', 'notIn', { param: 'constructor' })) })
        .expect(400);
      expect(edit.body.fields[0].field).toBe('definition.conditions.all[0].value.param');
      expect((await http().get(`/api/rules/${id}`).set(as('admin')).expect(200)).body.version).toBe(1);
    });
  });

  describe('a faulty rule written straight into the database', () => {
    const id = newId();

    beforeAll(async () => {
      // Around the API, as an old or hand-edited row could be: "in" against an inherited property.
      const broken = rule(id, leaf('reviewState', 'in', { param: 'constructor' }));
      await db.query('INSERT INTO compatibility_rules (rule_key, origin, definition, version, enabled) VALUES (?, ?, ?, 1, 1)', [
        id,
        'admin',
        JSON.stringify(broken),
      ]);
    });
    afterAll(async () => {
      // Before the next describe of any later file reads a matrix.
      await db.query('DELETE FROM compatibility_rules WHERE rule_key = ?', [id]);
    });

    it('GET /api/products/:id/matrix answers 200, every cell names the rule as broken, and every other rule is still evaluated', async () => {
      const res = await http().get(`/api/products/${TRACKER}/matrix`).set(as('procurement')).expect(200);
      const cells: Cell[] = res.body.cells;
      expect(cells.length).toBeGreaterThan(0);
      for (const cell of cells) {
        expect(cell.findings.filter((f) => f.ruleId === id)).toEqual([expect.objectContaining({ code: 'RULE_BROKEN', severity: 'no-data' })]);
        expect(cell.status).not.toBe('pass');
      }
      const column = res.body.columns.findIndex((c: { partId: number }) => c.partId === LOW_EFFICIENCY_CHIP);
      const ble = cells.find((c) => c.column === column && res.body.rows[c.row].radioId === TRACKER_BLE)!;
      expect(ble.status).toBe('fail');
      expect(ble.findings.map((f) => f.code)).toContain('EFFICIENCY_BELOW_FLOOR');
    });

    it('GET /api/products/:id/radios/:radioId/candidates answers 200 with the broken rule on every band', async () => {
      const res = await http().get(`/api/products/${TRACKER}/radios/${TRACKER_BLE}/candidates`).set(as('engineer')).expect(200);
      expect(res.body.candidates.length).toBeGreaterThan(0);
      for (const candidate of res.body.candidates) {
        expect(candidate.status).not.toBe('pass');
        for (const band of candidate.bands) expect(band.findings.map((f: Finding) => [f.ruleId, f.code])).toContainEqual([id, 'RULE_BROKEN']);
      }
    });

    it('POST /api/rules/preview of another rule answers 200', async () => {
      const res = await http()
        .post('/api/rules/preview')
        .set(as('admin'))
        .send({ definition: rule(newId()) })
        .expect(200);
      expect(res.body.cellsCompared).toBeGreaterThan(0);
    });

    it('GET /api/rules lists it, so an admin can find it', async () => {
      const res = await http().get('/api/rules').set(as('admin')).expect(200);
      expect(res.body.map((r: { id: string }) => r.id)).toContain(id);
    });
  });
});
