import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens } from '../support/api-app';
import { createDraft } from '../support/parts';

describe('concurrent edits of one part', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(async () => {
    await app.close();
  });

  describe('PATCH /api/parts/:id', () => {
    it('50 edits with the same version at once: exactly one 200, 49 × 409 PART_VERSION_CONFLICT, the stored part is the winner, one audit entry', async () => {
      const auth = { Authorization: `Bearer ${tokens.engineer}` };
      const draft = await createDraft(app, tokens.engineer, { title: 'Concurrency probe antenna' });
      const attempts = Array.from({ length: 50 }, (_, i) =>
        request(app.getHttpServer())
          .patch(`/api/parts/${draft.id}`)
          .set(auth)
          .send({ version: draft.version, title: `Edit ${i}`, notes: `note of edit ${i}`, lengthMm: 10 + i / 10 })
          .then((res) => ({ i, status: res.status, body: res.body })),
      );
      const results = await Promise.all(attempts);

      const winners = results.filter((r) => r.status === 200);
      const conflicts = results.filter((r) => r.status === 409);
      expect(winners).toHaveLength(1);
      expect(conflicts).toHaveLength(49);
      expect(new Set(conflicts.map((c) => c.body.code))).toEqual(new Set(['PART_VERSION_CONFLICT']));
      for (const conflict of conflicts) expect(conflict.body).toMatchObject({ expectedVersion: draft.version, currentVersion: draft.version + 1 });
      const winner = winners[0].i;

      const stored = await request(app.getHttpServer()).get(`/api/parts/${draft.id}`).set(auth).expect(200);
      expect(stored.body).toMatchObject({ version: draft.version + 1, title: `Edit ${winner}`, notes: `note of edit ${winner}`, lengthMm: 10 + winner / 10 });

      const history = await request(app.getHttpServer()).get(`/api/parts/${draft.id}/history`).set(auth).expect(200);
      const updates = history.body.items.filter((entry: { action: string }) => entry.action === 'updated');
      expect(updates).toHaveLength(1);
      expect(updates[0].changes).toMatchObject({ title: ['Concurrency probe antenna', `Edit ${winner}`], notes: [null, `note of edit ${winner}`] });
    }, 60000);
  });
});
