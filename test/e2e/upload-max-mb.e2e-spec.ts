import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens } from '../support/api-app';
import { createDraft } from '../support/parts';

jest.setTimeout(120_000);

/** UPLOAD_MAX_MB lowers every upload route's limit; each answers 413 with its own code and the limit. */
describe('UPLOAD_MAX_MB (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const previous = process.env.UPLOAD_MAX_MB;
  const limitBytes = 1024 * 1024;
  const overLimit = (head: string) => Buffer.concat([Buffer.from(head), Buffer.alloc(limitBytes + 1024, 0x20)]);
  const http = () => request(app.getHttpServer());
  const auth = () => ({ Authorization: `Bearer ${tokens.engineer}` });

  beforeAll(async () => {
    process.env.UPLOAD_MAX_MB = '1';
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(async () => {
    if (previous === undefined) delete process.env.UPLOAD_MAX_MB;
    else process.env.UPLOAD_MAX_MB = previous;
    await app?.close();
  });

  it('measurements: 413 MEASUREMENT_FILE_TOO_LARGE at the configured limit', async () => {
    const draft = await createDraft(app, tokens.engineer);
    const res = await http()
      .post(`/api/parts/${draft.id}/measurements`)
      .set(auth())
      .field('kind', 's11')
      .attach('file', overLimit('# MHz S RI R 50\n'), 'big.s1p')
      .expect(413);
    expect(res.body).toMatchObject({ code: 'MEASUREMENT_FILE_TOO_LARGE', field: 'file', limitBytes });
  });

  it('documents: 413 DOCUMENT_TOO_LARGE at the configured limit', async () => {
    const draft = await createDraft(app, tokens.engineer);
    const res = await http()
      .post(`/api/parts/${draft.id}/documents`)
      .set(auth())
      .field('kind', 'datasheet')
      .attach('file', overLimit('%PDF-1.4\n'), 'big.pdf')
      .expect(413);
    expect(res.body).toMatchObject({ code: 'DOCUMENT_TOO_LARGE', field: 'file', limitBytes });
  });

  it('imports: 413 PART_IMPORT_TOO_LARGE at the configured limit', async () => {
    const res = await http().post('/api/parts/imports').set(auth()).attach('file', overLimit('manufacturer,mpn\n'), 'big.csv').expect(413);
    expect(res.body).toMatchObject({ code: 'PART_IMPORT_TOO_LARGE', field: 'file', limitBytes });
  });

  it('Tools analysis: 413 TOUCHSTONE_TOO_LARGE at the configured limit', async () => {
    const res = await http().post('/api/rf/touchstone/analyze').set(auth()).attach('file', overLimit('# MHz S RI R 50\n'), 'big.s1p').expect(413);
    expect(res.body).toMatchObject({ code: 'TOUCHSTONE_TOO_LARGE', field: 'file', limitBytes });
  });

  it('a file under the limit still goes through', async () => {
    const res = await http()
      .post('/api/rf/touchstone/analyze')
      .set(auth())
      .attach('file', Buffer.from('# MHz S RI R 50\n800 0.2 0\n900 0.3 0\n'), 'ok.s1p')
      .expect(200);
    expect(res.body.points).toBe(2);
  });
});
