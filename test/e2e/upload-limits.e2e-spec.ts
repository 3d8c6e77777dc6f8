import type { INestApplication } from '@nestjs/common';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { loadConfig } from '../../src-server/config/app-config';
import { MEASUREMENT_MAX_BYTES } from '../../src-server/parts/measurements/measurements.service';
import { PART_IMPORT_MAX_BYTES } from '../../src-server/parts/import-export/part-csv.service';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { basisFields, createDraft, storedFilesOf, s1pWithGamma } from '../support/parts';

// PNG file signature (ISO/IEC 15948 §5.2): binary, contains NUL bytes.
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), Buffer.from('IHDR')]);

describe('upload size and type limits on every multipart route', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  let s3: S3Client;
  const config = loadConfig();
  const http = () => request(app.getHttpServer());
  const auth = () => ({ Authorization: `Bearer ${tokens.engineer}` });
  const db = () => app.get<DataSource>(getDataSourceToken());
  const storedOf = (partId: number) => storedFilesOf(app, s3, config.s3.bucket, partId);

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    s3 = new S3Client({
      endpoint: config.s3.endpoint,
      region: config.s3.region,
      forcePathStyle: true,
      credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
    });
  });
  afterAll(async () => {
    s3.destroy();
    await app.close();
  });

  describe('POST /api/parts/:id/measurements', () => {
    it('answers 413 MEASUREMENT_FILE_TOO_LARGE past 16 MiB and stores nothing', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const line = '868 0.2 0.0\n';
      const big = Buffer.from(`# MHz S RI R 50\n${line.repeat(Math.ceil((MEASUREMENT_MAX_BYTES + 1024) / line.length))}`);
      const res = await http().post(`/api/parts/${draft.id}/measurements`).set(auth()).field('kind', 's11').attach('file', big, 'big.s1p').expect(413);
      expect(res.body).toMatchObject({ code: 'MEASUREMENT_FILE_TOO_LARGE', field: 'file', limitBytes: MEASUREMENT_MAX_BYTES });
      expect(await storedOf(draft.id)).toEqual({ rows: 0, objects: 0 });
    });

    it('answers 415 MEASUREMENT_TYPE_NOT_ALLOWED for binary content whatever the name says, for Touchstone and CSV kinds', async () => {
      const draft = await createDraft(app, tokens.engineer);
      for (const [kind, name] of [
        ['s11', 'disguised.s1p'],
        ['efficiency', 'disguised.csv'],
      ]) {
        const res = await http()
          .post(`/api/parts/${draft.id}/measurements`)
          .set(auth())
          .field({ kind, ...basisFields(kind) })
          .attach('file', PNG, name)
          .expect(415);
        expect(res.body).toMatchObject({ code: 'MEASUREMENT_TYPE_NOT_ALLOWED', field: 'file' });
      }
      expect(await storedOf(draft.id)).toEqual({ rows: 0, objects: 0 });
    });
  });

  describe('POST /api/parts/:id/documents', () => {
    it('keeps a hostile file name out of the object key: the key stays under parts/<id>/documents/, the name is kept only as text', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const pdf = Buffer.from('%PDF-1.4\n% invented test datasheet\n%%EOF\n');
      const hostile = '../../../other-bucket/..\\evil..name%2F.pdf';
      const res = await http().post(`/api/parts/${draft.id}/documents`).set(auth()).field('kind', 'datasheet').attach('file', pdf, hostile).expect(201);
      const [row] = await db().query('SELECT object_key, file_name FROM part_documents WHERE id = ?', [res.body.id]);
      expect(row.object_key).toMatch(new RegExp(`^parts/${draft.id}/documents/[0-9a-f-]{36}-[A-Za-z0-9._-]+$`));
      expect(row.object_key).not.toContain('..');
      expect(row.object_key.split('/')).toHaveLength(4);
      const keys = (await s3.send(new ListObjectsV2Command({ Bucket: config.s3.bucket, Prefix: `parts/${draft.id}/` }))).Contents?.map((o) => o.Key);
      expect(keys).toEqual([row.object_key]);
    });
  });

  describe('POST /api/parts/imports', () => {
    it('answers 413 PART_IMPORT_TOO_LARGE past 4 MiB and 415 PART_IMPORT_NOT_CSV for binary content, importing nothing', async () => {
      const mpn = unique('LIM');
      const row = `Testbench Antennas,${mpn},Limit probe,chip,solder-pad,linear\n`;
      const big = Buffer.from(`manufacturer,mpn,title,formFactor,connector,polarization\n${row.repeat(Math.ceil(PART_IMPORT_MAX_BYTES / row.length) + 1)}`);
      const large = await http().post('/api/parts/imports').query({ dryRun: 'false' }).set(auth()).attach('file', big, 'parts.csv').expect(413);
      expect(large.body).toMatchObject({ code: 'PART_IMPORT_TOO_LARGE', field: 'file', limitBytes: PART_IMPORT_MAX_BYTES });
      const binary = await http().post('/api/parts/imports').query({ dryRun: 'false' }).set(auth()).attach('file', PNG, 'parts.csv').expect(415);
      expect(binary.body.code).toBe('PART_IMPORT_NOT_CSV');
      const [{ n }] = await db().query('SELECT COUNT(*) AS n FROM parts WHERE mpn = ?', [mpn]);
      expect(Number(n)).toBe(0);
    });
  });

  describe('POST /api/rf/touchstone/analyze', () => {
    it('answers 422 with a Touchstone code for binary content (its 413 is in rf-tools.e2e-spec.ts)', async () => {
      const res = await http().post('/api/rf/touchstone/analyze').set(auth()).attach('file', PNG, 'image.s1p').expect(422);
      expect(res.body.code).toMatch(/^TOUCHSTONE_/);
    });
  });

  it('a measurement within the limit still uploads (the limit is not a blanket refusal)', async () => {
    const draft = await createDraft(app, tokens.engineer);
    await http()
      .post(`/api/parts/${draft.id}/measurements`)
      .set(auth())
      .field('kind', 's11')
      .attach(
        'file',
        Buffer.from(
          s1pWithGamma([
            [800, 0.2],
            [900, 0.3],
          ]),
        ),
        'ok.s1p',
      )
      .expect(201);
    expect(await storedOf(draft.id)).toEqual({ rows: 1, objects: 1 });
  });
});
