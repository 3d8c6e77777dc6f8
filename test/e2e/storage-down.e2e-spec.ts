import type { INestApplication } from '@nestjs/common';
import { getDataSourceToken } from '@nestjs/typeorm';
import { createServer } from 'node:net';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApiApp, demoTokens } from '../support/api-app';
import { createDraft, s1pWithGamma } from '../support/parts';

const freePort = () =>
  new Promise<number>((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });

async function waitFor(check: () => Promise<boolean>, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('timed out');
}

describe('object storage down', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const originalPort = process.env.S3_PORT;
  const auth = () => ({ Authorization: `Bearer ${tokens.engineer}` });
  const rows = async (db: DataSource, partId: number) => {
    const [m] = await db.query('SELECT COUNT(*) AS n FROM part_measurements WHERE part_id = ?', [partId]);
    const [d] = await db.query('SELECT COUNT(*) AS n FROM part_documents WHERE part_id = ?', [partId]);
    return { measurements: Number(m.n), documents: Number(d.n) };
  };
  const notes = async (db: DataSource, partId: number) =>
    Number((await db.query("SELECT COUNT(*) AS n FROM pending_uploads WHERE object_key LIKE CONCAT('parts/', ?, '/%')", [partId]))[0].n);

  beforeAll(async () => {
    // Nothing listens on a port just freed: every S3 call is refused.
    process.env.S3_PORT = String(await freePort());
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(async () => {
    process.env.S3_PORT = originalPort;
    await app?.close();
  });

  describe('GET /api/health', () => {
    it('stays 200 while the database is up and reports "degraded" with storage "down" (uploads fail, reading the catalogue still works)', async () => {
      const res = await request(app.getHttpServer()).get('/api/health').expect(200);
      expect(res.body).toMatchObject({ status: 'degraded', db: 'up', storage: 'down', down: ['storage'] });
    });
  });

  describe('POST /api/parts/:id/measurements and /documents', () => {
    it('answer 503 STORAGE_UNAVAILABLE for a Touchstone file and a PDF and write no rows; the sweeper removes the notes once storage is back', async () => {
      const part = await createDraft(app, tokens.engineer);
      const curve = await request(app.getHttpServer())
        .post(`/api/parts/${part.id}/measurements`)
        .set(auth())
        .field('kind', 's11')
        .attach(
          'file',
          Buffer.from(
            s1pWithGamma([
              [800, 0.2],
              [900, 0.3],
              [1000, 0.25],
            ]),
          ),
          'sweep.s1p',
        )
        .expect(503);
      expect(curve.body).toMatchObject({ code: 'STORAGE_UNAVAILABLE', message: expect.stringMatching(/nothing was saved/) });
      const pdf = Buffer.from('%PDF-1.4\n% invented test datasheet\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
      const doc = await request(app.getHttpServer())
        .post(`/api/parts/${part.id}/documents`)
        .set(auth())
        .field('kind', 'datasheet')
        .attach('file', pdf, 'datasheet.pdf')
        .expect(503);
      expect(doc.body.code).toBe('STORAGE_UNAVAILABLE');

      const db = app.get<DataSource>(getDataSourceToken());
      expect(await rows(db, part.id)).toEqual({ measurements: 0, documents: 0 });
      const detail = await request(app.getHttpServer()).get(`/api/parts/${part.id}`).set(auth()).expect(200);
      expect(detail.body.version).toBe(part.version);
      // Whether a refused PUT left bytes behind cannot be known, so each upload's note stays for the sweeper.
      expect(await notes(db, part.id)).toBe(2);

      await app.close();
      process.env.S3_PORT = originalPort;
      app = await createApiApp();
      const healed = app.get<DataSource>(getDataSourceToken());
      await waitFor(async () => (await notes(healed, part.id)) === 0, 15000);
      expect(await rows(healed, part.id)).toEqual({ measurements: 0, documents: 0 });
    }, 40000);
  });
});
