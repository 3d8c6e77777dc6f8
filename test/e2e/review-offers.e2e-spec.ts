import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import request from 'supertest';
import { createApiApp, DEMO, demoTokens, unique } from '../support/api-app';
import { waitForMail } from '../support/mailbox';
import { createDraft, s1pWithGamma } from '../support/parts';

type Role = 'admin' | 'engineer' | 'procurement';

describe('review aid and offers as buyers keep them (API)', () => {
  let app: INestApplication;
  let tokens: Record<Role, string>;
  const http = () => request(app.getHttpServer());
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  /** Γ = (VSWR − 1)/(VSWR + 1) (Pozar 4th ed. §2.3): VSWR 6.72 → 0.7409. */
  const gammaOf = (vswr: number) => (vswr - 1) / (vswr + 1);

  describe('GET /parts/review-queue and GET /parts/:id/consistency', () => {
    it('every role reads a part page check; 404 for a part that does not exist', async () => {
      for (const role of ['engineer', 'procurement', 'admin'] as Role[]) await http().get('/api/parts/999999999/consistency').set(as(role)).expect(404);
    });

    it('sets claims against measurements, lists what is missing and flags an implied directivity a chip cannot have', async () => {
      const part = await createDraft(app, tokens.engineer, {
        formFactor: 'chip',
        specBands: [
          { fromMhz: 1710, toMhz: 2690, maxVswr: 2 },
          // The example: 3 dBi peak at 20 % radiation efficiency implies 3 + 6.99 = 9.99 dBi (20 % = −6.99 dB).
          { fromMhz: 824, toMhz: 960, peakGainDbi: 3, gainBasis: 'peak', efficiencyPct: 20, efficiencyBasis: 'radiation' },
        ],
      });
      const s11 = s1pWithGamma([
        [800, 0.2],
        [1710, 0.2],
        [2690, gammaOf(6.72)],
        [2700, gammaOf(6.72)],
      ]);
      await http().post(`/api/parts/${part.id}/measurements`).set(as('engineer')).field('kind', 's11').attach('file', Buffer.from(s11), 'a.s1p').expect(201);
      await http().post(`/api/parts/${part.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);

      const queue = await http().get('/api/parts/review-queue').set(as('admin')).expect(200);
      const item = queue.body.find((q: { id: number }) => q.id === part.id);
      expect(item.check.missing).toEqual(['datasheet']);
      expect(item.check.plausibleMaxDirectivityDbi).toBe(5);
      expect(item.check.disagreements).toBe(2);
      const [gainBand, vswrBand] = item.check.bands;
      expect(vswrBand).toMatchObject({ fromMhz: 1710, toMhz: 2690, claimedMaxVswr: 2, vswrAgrees: false, measuredWorstVswrAtMhz: 2690 });
      expect(vswrBand.measuredWorstVswr).toBeCloseTo(6.72, 3);
      expect(gainBand.directivity).toMatchObject({ source: 'datasheet', verdict: 'above-form-factor' });
      expect(gainBand.directivity.maxDbi).toBeCloseTo(9.99, 2);

      const page = await http().get(`/api/parts/${part.id}/consistency`).set(as('procurement')).expect(200);
      expect(page.body).toEqual(item.check);
    });
  });

  describe('POST /parts/:id/approval and /rejection with a comment', () => {
    it('puts the comment in the submitter e-mail and in the history', async () => {
      const part = await createDraft(app, tokens.engineer);
      await http().post(`/api/parts/${part.id}/submission`).set(as('engineer')).send({ version: 1 }).expect(200);
      const comment = `Checked against the datasheet ${unique('c')}`;
      await http().post(`/api/parts/${part.id}/approval`).set(as('admin')).send({ version: 2, comment }).expect(200);
      const mail = await waitForMail(DEMO.engineer, new RegExp(`approved: .*${part.mpn}`));
      expect(mail.text).toContain(comment);
      const history = await http().get(`/api/parts/${part.id}/history`).set(as('engineer')).expect(200);
      expect(history.body.items[0]).toMatchObject({ action: 'approved', changes: { comment, reviewState: ['in-review', 'approved'] } });
    });
  });

  describe('offers: PATCH, DELETE with undo, history values', () => {
    const offer = {
      supplier: 'Brightwater Components',
      currency: 'USD',
      priceBreaks: [
        { quantity: 1, unitPrice: '0.95' },
        { quantity: 100, unitPrice: '0.60' },
        { quantity: 1000, unitPrice: '0.38' },
      ],
      moq: 1,
      stock: 12000,
      leadTimeDays: 28,
    };

    it('refuses bad edits naming the field (4xx), never a 5xx', async () => {
      const part = await createDraft(app, tokens.engineer);
      const created = await http().post(`/api/parts/${part.id}/offers`).set(as('procurement')).send(offer).expect(201);
      const path = `/api/parts/${part.id}/offers/${created.body.id}`;
      const cases: [Record<string, unknown>, string][] = [
        [{ stock: -1 }, 'stock'],
        [{ moq: 0 }, 'moq'],
        [{ currency: 'usd' }, 'currency'],
        [{ priceBreaks: [] }, 'priceBreaks'],
        [
          {
            priceBreaks: [
              { quantity: 10, unitPrice: '1' },
              { quantity: 0, unitPrice: '1' },
            ],
          },
          'priceBreaks.1.quantity',
        ],
        [
          {
            priceBreaks: [
              { quantity: 10, unitPrice: '1' },
              { quantity: 10, unitPrice: '0.9' },
            ],
          },
          'priceBreaks.1.quantity',
        ],
        [{ supplier: null }, 'supplier'],
      ];
      for (const [body, field] of cases) {
        const res = await http()
          .patch(path)
          .set(as('procurement'))
          .send({ version: 1, ...body })
          .expect(400);
        expect(res.body.fields.map((f: { field: string }) => f.field)).toContain(field);
      }
      expect((await http().get(`/api/parts/${part.id}`).set(as('procurement')).expect(200)).body.offers[0]).toMatchObject({ version: 1, stock: 12000 });
    });

    it('edits three price breaks, stock and lead time; the history holds the old and new values', async () => {
      const part = await createDraft(app, tokens.engineer);
      const created = await http().post(`/api/parts/${part.id}/offers`).set(as('procurement')).send(offer).expect(201);
      expect(created.body).toMatchObject({ stock: 12000, moq: 1, priceBreaks: offer.priceBreaks });
      const newBreaks = [
        { quantity: 1000, unitPrice: '0.35' },
        { quantity: 1, unitPrice: '0.90' },
        { quantity: 250, unitPrice: '0.55' },
      ];
      const edited = await http()
        .patch(`/api/parts/${part.id}/offers/${created.body.id}`)
        .set(as('procurement'))
        .send({ version: 1, priceBreaks: newBreaks, stock: 800, leadTimeDays: 42 })
        .expect(200);
      expect(edited.body).toMatchObject({ version: 2, stock: 800, leadTimeDays: 42 });
      expect(edited.body.priceBreaks).toEqual([
        { quantity: 1, unitPrice: '0.90' },
        { quantity: 250, unitPrice: '0.55' },
        { quantity: 1000, unitPrice: '0.35' },
      ]);
      const history = await http().get(`/api/parts/${part.id}/history`).set(as('procurement')).expect(200);
      const entry = history.body.items.find((e: { action: string }) => e.action === 'offer-updated');
      expect(entry.changes).toEqual({
        offerId: created.body.id,
        stock: [12000, 800],
        leadTimeDays: [28, 42],
        priceBreaks: [offer.priceBreaks, edited.body.priceBreaks],
      });
    });

    it('takes a removal back within the undo window (after a reload too), refuses it after (410), and records both', async () => {
      const part = await createDraft(app, tokens.engineer);
      const created = await http().post(`/api/parts/${part.id}/offers`).set(as('procurement')).send(offer).expect(201);
      const id = created.body.id;
      await http().get(`/api/parts/${part.id}/offer-removals`).set(as('engineer')).expect(403);
      await http().post(`/api/parts/${part.id}/offers/${id}/restoration`).set(as('engineer')).expect(403);
      expect((await http().post(`/api/parts/${part.id}/offers/${id}/restoration`).set(as('procurement')).expect(404)).body.code).toBe(
        'OFFER_REMOVAL_NOT_FOUND',
      );

      await http().delete(`/api/parts/${part.id}/offers/${id}`).set(as('procurement')).expect(204);
      expect((await http().get(`/api/parts/${part.id}`).set(as('procurement')).expect(200)).body.offers).toEqual([]);
      const removals = await http().get(`/api/parts/${part.id}/offer-removals`).set(as('procurement')).expect(200);
      expect(removals.body).toEqual([expect.objectContaining({ offerId: id, supplier: offer.supplier })]);
      expect(Date.parse(removals.body[0].undoUntil) - Date.parse(removals.body[0].removedAt)).toBe(30_000);

      const restored = await http().post(`/api/parts/${part.id}/offers/${id}/restoration`).set(as('procurement')).expect(200);
      expect(restored.body).toMatchObject({ id, stock: 12000, priceBreaks: offer.priceBreaks, version: 2 });
      expect((await http().get(`/api/parts/${part.id}`).set(as('procurement')).expect(200)).body.offers).toEqual([restored.body]);
      expect((await http().get(`/api/parts/${part.id}/offer-removals`).set(as('procurement')).expect(200)).body).toEqual([]);

      // Past the window: the removal is made 31 s old in the database rather than waiting.
      await http().delete(`/api/parts/${part.id}/offers/${id}`).set(as('admin')).expect(204);
      await app
        .get<DataSource>(getDataSourceToken())
        .query('UPDATE part_offer_removals SET removed_at = ? WHERE offer_id = ?', [new Date(Date.now() - 31_000), id]);
      expect((await http().post(`/api/parts/${part.id}/offers/${id}/restoration`).set(as('procurement')).expect(410)).body.code).toBe('OFFER_UNDO_EXPIRED');
      expect((await http().get(`/api/parts/${part.id}/offer-removals`).set(as('procurement')).expect(200)).body).toEqual([]);
      expect((await http().get(`/api/parts/${part.id}`).set(as('procurement')).expect(200)).body.offers).toEqual([]);

      const history = await http().get(`/api/parts/${part.id}/history`).set(as('procurement')).expect(200);
      const actions = history.body.items.map((e: { action: string }) => e.action);
      expect(actions.slice(0, 4)).toEqual(['offer-removed', 'offer-restored', 'offer-removed', 'offer-added']);
      expect(history.body.items[0].changes).toMatchObject({ offerId: id, supplier: offer.supplier, stock: 12000, priceBreaks: offer.priceBreaks });
    });
  });
});
