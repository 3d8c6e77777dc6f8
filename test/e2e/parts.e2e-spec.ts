import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, DEMO, demoTokens, unique } from '../support/api-app';
import { waitForMail } from '../support/mailbox';
import { createDraft, draftBody } from '../support/parts';

type Role = 'admin' | 'engineer' | 'procurement';

describe('parts: CRUD, lifecycle, permissions (API)', () => {
  let app: INestApplication;
  let tokens: Record<Role, string>;
  const http = () => request(app.getHttpServer());
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  describe('who may call which route', () => {
    // Allowed roles per route, as issue 5 "Permissions" states them.
    const routes: { method: 'get' | 'post' | 'patch' | 'put' | 'delete'; path: string; roles: Role[] }[] = [
      { method: 'get', path: '/api/parts', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'get', path: '/api/parts/export', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'post', path: '/api/parts', roles: ['admin', 'engineer'] },
      { method: 'post', path: '/api/parts/imports', roles: ['admin', 'engineer'] },
      { method: 'get', path: '/api/parts/review-queue', roles: ['admin'] },
      { method: 'get', path: '/api/parts/1', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'patch', path: '/api/parts/1', roles: ['admin', 'engineer'] },
      { method: 'get', path: '/api/parts/1/history', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'post', path: '/api/parts/1/submission', roles: ['admin', 'engineer'] },
      { method: 'post', path: '/api/parts/1/approval', roles: ['admin'] },
      { method: 'post', path: '/api/parts/1/rejection', roles: ['admin'] },
      { method: 'post', path: '/api/parts/1/restriction', roles: ['admin'] },
      { method: 'post', path: '/api/parts/1/reinstatement', roles: ['admin'] },
      { method: 'post', path: '/api/parts/1/retirement', roles: ['admin'] },
      { method: 'post', path: '/api/parts/1/measurements', roles: ['admin', 'engineer'] },
      { method: 'get', path: '/api/parts/1/measurements/1/points', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'get', path: '/api/parts/1/measurements/1/file', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'delete', path: '/api/parts/1/measurements/1', roles: ['admin', 'engineer'] },
      { method: 'post', path: '/api/parts/1/documents', roles: ['admin', 'engineer'] },
      { method: 'get', path: '/api/parts/1/documents/1/file', roles: ['admin', 'engineer', 'procurement'] },
      { method: 'delete', path: '/api/parts/1/documents/1', roles: ['admin', 'engineer'] },
      { method: 'post', path: '/api/parts/1/offers', roles: ['admin', 'procurement'] },
      { method: 'patch', path: '/api/parts/1/offers/1', roles: ['admin', 'procurement'] },
      { method: 'delete', path: '/api/parts/1/offers/1', roles: ['admin', 'procurement'] },
      { method: 'put', path: '/api/parts/1/alternates/2', roles: ['admin', 'procurement'] },
      { method: 'delete', path: '/api/parts/1/alternates/2', roles: ['admin', 'procurement'] },
    ];

    it.each(routes)('$method $path: 401 anonymous, 403 FORBIDDEN_ROLE for roles outside $roles', async ({ method, path, roles }) => {
      await http()[method](path).expect(401);
      for (const role of (['admin', 'engineer', 'procurement'] as Role[]).filter((r) => !roles.includes(r))) {
        const res = await http()[method](path).set(as(role));
        expect([role, res.status, res.body.code]).toEqual([role, 403, 'FORBIDDEN_ROLE']);
      }
      for (const role of roles) {
        // Allowed roles get past the guard: whatever the answer, it is not a role refusal.
        const res = await http()[method](path).set(as(role));
        expect([role, res.body.code]).not.toEqual([role, 'FORBIDDEN_ROLE']);
        expect(res.status).not.toBe(401);
      }
    });
  });

  describe('POST /api/parts', () => {
    it('answers 400 naming each missing or bad field', async () => {
      const res = await http().post('/api/parts').set(as('engineer')).send({ manufacturer: 'X', formFactor: 'wire', connector: 'SMA' }).expect(400);
      expect(res.body.code).toBe('VALIDATION_FAILED');
      const fields = res.body.fields.map((f: { field: string }) => f.field);
      expect(fields).toEqual(expect.arrayContaining(['mpn', 'title', 'formFactor', 'polarization']));
      const bands = await http()
        .post('/api/parts')
        .set(as('engineer'))
        .send(draftBody({ specBands: [{ fromMhz: 960, toMhz: 880 }] }))
        .expect(400);
      expect(bands.body.fields[0].field).toBe('specBands.0.toMhz');
    });

    it('creates a draft owned by the engineer, and refuses the same MPN twice for one manufacturer with 409', async () => {
      const body = draftBody({ specBands: [{ fromMhz: 791, toMhz: 862, maxVswr: 2.5, efficiencyPct: 45 }], evalGroundLengthMm: 100, evalGroundWidthMm: 40 });
      const res = await http().post('/api/parts').set(as('engineer')).send(body).expect(201);
      expect(res.body).toMatchObject({
        mpn: body.mpn,
        manufacturer: 'Testbench Antennas',
        reviewState: 'draft',
        lifecycle: 'active',
        version: 1,
        nominalImpedanceOhms: 50,
      });
      expect(res.body.createdBy.name).toEqual(expect.any(String));
      expect(res.body.specBands).toEqual([expect.objectContaining({ fromMhz: 791, toMhz: 862, maxVswr: 2.5, efficiencyPct: 45 })]);
      expect(res.body.permissions).toMatchObject({ edit: true, submit: true, review: false, editSourcing: false });
      const dup = await http().post('/api/parts').set(as('admin')).send(body).expect(409);
      expect(dup.body.code).toBe('PART_MPN_TAKEN');
      // Another manufacturer may use the same MPN.
      await http()
        .post('/api/parts')
        .set(as('admin'))
        .send({ ...body, manufacturer: unique('Other Maker') })
        .expect(201);
    });
  });

  describe('GET /api/parts/:id', () => {
    it('answers 400 for a bad id and 404 for an unknown one', async () => {
      expect((await http().get('/api/parts/abc').set(as('procurement')).expect(400)).body.fields[0].field).toBe('id');
      expect((await http().get('/api/parts/99999999').set(as('procurement')).expect(404)).body.code).toBe('PART_NOT_FOUND');
    });
  });

  describe('PATCH /api/parts/:id', () => {
    it("refuses another engineer's draft, procurement, and a part that is no longer a draft", async () => {
      const mine = await createDraft(app, tokens.admin);
      const res = await http().patch(`/api/parts/${mine.id}`).set(as('engineer')).send({ version: 1, title: 'Hijack' }).expect(403);
      expect(res.body.code).toBe('PART_EDIT_FORBIDDEN');
      expect((await http().patch(`/api/parts/${mine.id}`).set(as('procurement')).send({ version: 1, title: 'x' }).expect(403)).body.code).toBe(
        'FORBIDDEN_ROLE',
      );

      const draft = await createDraft(app, tokens.engineer);
      await http().post(`/api/parts/${draft.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);
      const locked = await http().patch(`/api/parts/${draft.id}`).set(as('engineer')).send({ version: 2, title: 'Late edit' }).expect(403);
      expect(locked.body.code).toBe('PART_EDIT_FORBIDDEN');
      // Admins edit everything.
      await http().patch(`/api/parts/${draft.id}`).set(as('admin')).send({ version: 2, title: 'Curated title' }).expect(200);
    });

    it('answers 409 PART_VERSION_CONFLICT on a stale edit and keeps the first edit', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const first = await http().patch(`/api/parts/${draft.id}`).set(as('engineer')).send({ version: 1, title: 'First edit' }).expect(200);
      expect(first.body.version).toBe(2);
      const stale = await http().patch(`/api/parts/${draft.id}`).set(as('engineer')).send({ version: 1, title: 'Second edit' }).expect(409);
      expect(stale.body).toMatchObject({ code: 'PART_VERSION_CONFLICT', expectedVersion: 1, currentVersion: 2 });
      const now = await http().get(`/api/parts/${draft.id}`).set(as('engineer')).expect(200);
      expect(now.body.title).toBe('First edit');
    });

    it('edits fields and spec bands, refuses clearing a required field, and records the change in the history', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const cleared = await http().patch(`/api/parts/${draft.id}`).set(as('engineer')).send({ version: 1, title: null }).expect(400);
      expect(cleared.body.fields[0].field).toBe('title');
      const res = await http()
        .patch(`/api/parts/${draft.id}`)
        .set(as('engineer'))
        .send({
          version: 1,
          connector: 'SMA',
          notes: 'Needs 3 mm clearance',
          specBands: [{ fromMhz: 2400, toMhz: 2483.5, minReturnLossDb: 10, peakGainDbi: 2.1 }],
        })
        .expect(200);
      expect(res.body).toMatchObject({ connector: 'SMA', notes: 'Needs 3 mm clearance', version: 2 });
      expect(res.body.specBands).toHaveLength(1);
      const history = await http().get(`/api/parts/${draft.id}/history`).set(as('procurement')).expect(200);
      const updated = history.body.items.find((e: { action: string }) => e.action === 'updated');
      expect(updated.changes.connector).toEqual(['solder-pad', 'SMA']);
      expect(updated.changes.specBands[1]).toEqual([expect.objectContaining({ fromMhz: 2400, minReturnLossDb: 10 })]);
      expect(history.body.items.map((e: { action: string }) => e.action)).toContain('created');
    });
  });

  describe('PATCH /api/parts/:id spec band bases', () => {
    it('refuses a basis outside its enumeration, naming the field', async () => {
      const draft = await createDraft(app, tokens.engineer);
      for (const [field, value] of [
        ['efficiencyBasis', 'peak'],
        ['efficiencyStatistic', 'median'],
        ['gainBasis', 'total'],
      ]) {
        const res = await http()
          .patch(`/api/parts/${draft.id}`)
          .set(as('engineer'))
          .send({ version: 1, specBands: [{ fromMhz: 2400, toMhz: 2483.5, efficiencyPct: 50, [field]: value }] })
          .expect(400);
        expect(res.body.fields.map((f: { field: string }) => f.field)).toEqual([`specBands.0.${field}`]);
      }
    });

    it('stores the basis each datasheet line states, and the usual one (total, average, peak) where it states none', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const res = await http()
        .patch(`/api/parts/${draft.id}`)
        .set(as('engineer'))
        .send({
          version: 1,
          specBands: [
            {
              fromMhz: 791,
              toMhz: 862,
              maxVswr: 3,
              efficiencyPct: 40,
              efficiencyBasis: 'radiation',
              efficiencyStatistic: 'minimum',
              peakGainDbi: 1,
              gainBasis: 'realized',
            },
            { fromMhz: 880, toMhz: 960, maxVswr: 3, efficiencyPct: 40 },
          ],
        })
        .expect(200);
      expect(res.body.specBands).toEqual([
        expect.objectContaining({ fromMhz: 791, efficiencyBasis: 'radiation', efficiencyStatistic: 'minimum', gainBasis: 'realized' }),
        expect.objectContaining({ fromMhz: 880, efficiencyBasis: 'total', efficiencyStatistic: 'average', gainBasis: 'peak' }),
      ]);
      // The part page reads the same figures: 40 % radiation at VSWR 3 is 30 % total, 40 % total stays 40 %
      // (|Γ| = (VSWR − 1)/(VSWR + 1) = 0.5, 1 − |Γ|² = 0.75; Pozar, Microwave Engineering 4th ed. §2.3).
      const radiation = await http()
        .get('/api/parts')
        .query({ q: draft.mpn, covers: '791-862', vswrMax: 3, minEfficiencyPct: 30 })
        .set(as('engineer'))
        .expect(200);
      expect(radiation.body.total).toBe(1);
      const under = await http()
        .get('/api/parts')
        .query({ q: draft.mpn, covers: '791-862', vswrMax: 3, minEfficiencyPct: 30.01 })
        .set(as('engineer'))
        .expect(200);
      expect(under.body.total).toBe(0);
      const total = await http().get('/api/parts').query({ q: draft.mpn, covers: '880-960', vswrMax: 3, minEfficiencyPct: 40 }).set(as('engineer')).expect(200);
      expect(total.body.total).toBe(1);
    });
  });

  describe('review lifecycle and e-mail', () => {
    it('submit → admins get a mail; approve → the submitter gets a mail; the part leaves the queue', async () => {
      const draft = await createDraft(app, tokens.engineer, { title: 'Lifecycle happy path' });
      const submitted = await http().post(`/api/parts/${draft.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);
      expect(submitted.body).toMatchObject({ reviewState: 'in-review', version: 2 });
      const toAdmin = await waitForMail(DEMO.admin, new RegExp(`for review: .*${draft.mpn}`));
      expect(toAdmin.text).toContain(`/catalogue/parts/${draft.id}`);

      const queue = await http().get('/api/parts/review-queue').set(as('admin')).expect(200);
      expect(queue.body.find((q: { id: number }) => q.id === draft.id)).toMatchObject({ mpn: draft.mpn, submittedBy: { name: expect.any(String) } });

      const stale = await http().post(`/api/parts/${draft.id}/approval`).set(as('admin')).send({ version: 1 }).expect(409);
      expect(stale.body.code).toBe('PART_VERSION_CONFLICT');
      const approved = await http().post(`/api/parts/${draft.id}/approval`).set(as('admin')).send({ version: 2, comment: 'Data complete' }).expect(200);
      expect(approved.body).toMatchObject({ reviewState: 'approved', version: 3, reviewedBy: { name: expect.any(String) } });
      const toEngineer = await waitForMail(DEMO.engineer, new RegExp(`approved: .*${draft.mpn}`));
      expect(toEngineer.text).toContain('Data complete');
      const after = await http().get('/api/parts/review-queue').set(as('admin')).expect(200);
      expect(after.body.map((q: { id: number }) => q.id)).not.toContain(draft.id);
    });

    it('rejection needs a comment, returns the part to draft with it, and mails the submitter the comment', async () => {
      const draft = await createDraft(app, tokens.engineer);
      await http().post(`/api/parts/${draft.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);
      const bare = await http().post(`/api/parts/${draft.id}/rejection`).set(as('admin')).send({ version: 2 }).expect(400);
      expect(bare.body.fields[0].field).toBe('comment');
      const comment = `Efficiency curve missing below 791 MHz ${unique('c')}`;
      const rejected = await http().post(`/api/parts/${draft.id}/rejection`).set(as('admin')).send({ version: 2, comment }).expect(200);
      expect(rejected.body).toMatchObject({ reviewState: 'draft', reviewComment: comment });
      const mail = await waitForMail(DEMO.engineer, new RegExp(`rejected: .*${draft.mpn}`));
      expect(mail.text).toContain(comment);
      // Back in draft, the engineer may edit it again.
      await http().patch(`/api/parts/${draft.id}`).set(as('engineer')).send({ version: 3, title: 'Fixed' }).expect(200);
    });

    it('refuses transitions from the wrong state with 409 PART_STATE_CONFLICT; restrict, reinstate and retire follow the lifecycle', async () => {
      const draft = await createDraft(app, tokens.admin);
      const early = await http().post(`/api/parts/${draft.id}/approval`).set(as('admin')).send({ version: 1 }).expect(409);
      expect(early.body).toMatchObject({ code: 'PART_STATE_CONFLICT', reviewState: 'draft' });
      await http().post(`/api/parts/${draft.id}/submission`).set(as('admin')).send({ version: 1 }).expect(200);
      await http().post(`/api/parts/${draft.id}/approval`).set(as('admin')).send({ version: 2 }).expect(200);
      expect((await http().post(`/api/parts/${draft.id}/restriction`).set(as('admin')).send({ version: 3 }).expect(400)).body.fields[0].field).toBe('comment');
      const restricted = await http()
        .post(`/api/parts/${draft.id}/restriction`)
        .set(as('admin'))
        .send({ version: 3, comment: 'Supplier allocation' })
        .expect(200);
      expect(restricted.body.reviewState).toBe('restricted');
      expect((await http().post(`/api/parts/${draft.id}/reinstatement`).set(as('admin')).send({ version: 4 }).expect(200)).body.reviewState).toBe('approved');
      expect((await http().post(`/api/parts/${draft.id}/retirement`).set(as('admin')).send({ version: 5 }).expect(200)).body.reviewState).toBe('retired');
      await http().post(`/api/parts/${draft.id}/submission`).set(as('admin')).send({ version: 6 }).expect(409);
      const history = await http().get(`/api/parts/${draft.id}/history`).set(as('engineer')).expect(200);
      expect(history.body.items.map((e: { action: string }) => e.action)).toEqual(['retired', 'reinstated', 'restricted', 'approved', 'submitted', 'created']);
    });

    it("refuses an engineer submitting someone else's draft", async () => {
      const draft = await createDraft(app, tokens.admin);
      expect((await http().post(`/api/parts/${draft.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(403)).body.code).toBe(
        'PART_EDIT_FORBIDDEN',
      );
    });
  });

  describe('sourcing: offers and alternates', () => {
    it('procurement adds and edits offers (409 on a stale version), links alternates both ways; engineers may not', async () => {
      const a = await createDraft(app, tokens.engineer);
      const b = await createDraft(app, tokens.engineer);
      const offer = {
        supplier: 'Brightwater Components',
        sku: 'BW-1',
        currency: 'USD',
        priceBreaks: [
          { quantity: 1000, unitPrice: '0.38' },
          { quantity: 1, unitPrice: '0.9500' },
        ],
        moq: 1,
        leadTimeDays: 28,
        lastCheckedOn: '2025-11-20',
      };
      expect((await http().post(`/api/parts/${a.id}/offers`).set(as('engineer')).send(offer).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      const bad = await http()
        .post(`/api/parts/${a.id}/offers`)
        .set(as('procurement'))
        .send({ ...offer, priceBreaks: [{ quantity: 1, unitPrice: '0.1234567' }] })
        .expect(400);
      expect(bad.body.fields[0].field).toBe('priceBreaks.0.unitPrice');
      const created = await http().post(`/api/parts/${a.id}/offers`).set(as('procurement')).send(offer).expect(201);
      expect(created.body.priceBreaks.map((p: { quantity: number }) => p.quantity)).toEqual([1, 1000]);
      const edited = await http()
        .patch(`/api/parts/${a.id}/offers/${created.body.id}`)
        .set(as('procurement'))
        .send({ version: 1, leadTimeDays: 42 })
        .expect(200);
      expect(edited.body).toMatchObject({ leadTimeDays: 42, version: 2 });
      expect(
        (await http().patch(`/api/parts/${a.id}/offers/${created.body.id}`).set(as('procurement')).send({ version: 1, leadTimeDays: 7 }).expect(409)).body.code,
      ).toBe('OFFER_VERSION_CONFLICT');

      await http().put(`/api/parts/${a.id}/alternates/${b.id}`).set(as('procurement')).send({ kind: 'second-source', note: 'Same footprint' }).expect(204);
      expect((await http().put(`/api/parts/${a.id}/alternates/${a.id}`).set(as('procurement')).send({ kind: 'alternate' }).expect(400)).body.code).toBe(
        'ALTERNATE_SELF',
      );
      const detailB = await http().get(`/api/parts/${b.id}`).set(as('procurement')).expect(200);
      expect(detailB.body.alternates).toEqual([expect.objectContaining({ partId: a.id, kind: 'second-source', note: 'Same footprint' })]);
      const detailA = await http().get(`/api/parts/${a.id}`).set(as('procurement')).expect(200);
      expect(detailA.body.offers[0]).toMatchObject({ supplier: 'Brightwater Components', leadTimeDays: 42 });
      expect(detailA.body.permissions).toMatchObject({ edit: false, editSourcing: true });
      await http().delete(`/api/parts/${b.id}/alternates/${a.id}`).set(as('procurement')).expect(204);
      expect((await http().get(`/api/parts/${a.id}`).set(as('procurement')).expect(200)).body.alternates).toEqual([]);
      await http().delete(`/api/parts/${a.id}/offers/${created.body.id}`).set(as('admin')).expect(204);
      const history = await http().get(`/api/parts/${a.id}/history`).set(as('procurement')).expect(200);
      expect(history.body.items.map((e: { action: string }) => e.action)).toEqual(
        expect.arrayContaining(['offer-added', 'offer-updated', 'offer-removed', 'alternate-linked', 'alternate-unlinked']),
      );
    });
  });
});
