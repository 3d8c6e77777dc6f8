import type { INestApplication } from '@nestjs/common';
import { S3Client } from '@aws-sdk/client-s3';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { loadConfig } from '../../src-server/config/app-config';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { basisFields, createDraft, storedFilesOf, csvCurve, s1pWithGamma } from '../support/parts';

jest.setTimeout(120_000);

const MIB = 1024 * 1024;
const IMPORT_HEADER = 'manufacturer,mpn,title,formFactor,connector,polarization,nominalImpedanceOhms,specBands\n';

describe('bounded parsers of uploaded files (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  let s3: S3Client;
  const config = loadConfig();
  const http = () => request(app.getHttpServer());
  const auth = () => ({ Authorization: `Bearer ${tokens.engineer}` });
  const db = () => app.get<DataSource>(getDataSourceToken());
  const storedOf = (partId: number) => storedFilesOf(app, s3, config.s3.bucket, partId);
  const upload = (partId: number, kind: string, name: string, content: string | Buffer, fields: Record<string, string> = {}) => {
    let req = http().post(`/api/parts/${partId}/measurements`).set(auth()).field('kind', kind);
    for (const [k, v] of Object.entries({ ...basisFields(kind), ...fields })) req = req.field(k, v);
    return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);
  };
  /** "Check file" and the real upload answer the same for a bad file, and nothing is stored. */
  const checkAndUpload = async (kind: string, name: string, content: string | Buffer, fields: Record<string, string> = {}) => {
    const draft = await createDraft(app, tokens.engineer);
    const check = await upload(draft.id, kind, name, content, { ...fields, dryRun: 'true' });
    const real = await upload(draft.id, kind, name, content, fields);
    expect(await storedOf(draft.id)).toEqual({ rows: 0, objects: 0 });
    return { check, real };
  };
  const importCsv = (text: string, dryRun: boolean) =>
    http()
      .post('/api/parts/imports')
      .query({ dryRun: String(dryRun) })
      .set(auth())
      .attach('file', Buffer.from(text), 'parts.csv');

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
    s3?.destroy();
    await app?.close();
  });

  describe('POST /api/parts/:id/measurements', () => {
    it('answers 422 CSV_TOO_MANY_LINES for 16 MiB of short CSV rows, quickly, and stores nothing', async () => {
      const rows = '1,1\n'.repeat((16 * MIB - 64) / 4);
      const started = Date.now();
      const { check, real } = await checkAndUpload('efficiency', 'many.csv', `frequency (MHz),efficiency (%)\n${rows}`);
      expect(check.status).toBe(422);
      expect(check.body).toMatchObject({ code: 'CSV_TOO_MANY_LINES', line: expect.any(Number) });
      expect(real.status).toBe(422);
      expect(real.body.code).toBe('CSV_TOO_MANY_LINES');
      expect(Date.now() - started).toBeLessThan(30_000);
    });

    it.each([
      ['a number past the double range (1e309)', '# MHz S RI R 50\n800 0.1 0\n900 1e309 0\n', 'TOUCHSTONE_BAD_NUMBER', 3],
      ['NaN', '# MHz S RI R 50\n800 0.1 0\nNaN 0.1 0\n', 'TOUCHSTONE_BAD_NUMBER', 3],
      ['Infinity', '# MHz S RI R 50\n800 0.1 0\n900 Infinity 0\n', 'TOUCHSTONE_BAD_NUMBER', 3],
      ['a frequency that overflows in Hz', '# GHz S RI R 50\n0.8 0.1 0\n1e300 0.1 0\n', 'TOUCHSTONE_BAD_NUMBER', 3],
      ['a dB value that overflows', '# MHz S DB R 50\n800 -10 0\n900 7000 0\n', 'TOUCHSTONE_BAD_NUMBER', 3],
      ['|S11| above 1 (a calibration error)', '# MHz S MA R 50\n800 0.5 0\n850 1.2 0\n900 0.5 0\n', 'MEASUREMENT_REFLECTION_ABOVE_ONE', 3],
    ])('answers the same 422 with the line for %s in "Check file" and in the upload', async (_name, file, code, line) => {
      const { check, real } = await checkAndUpload('s11', 'a.s1p', file);
      expect({ status: check.status, code: check.body.code, line: check.body.line }).toEqual({ status: 422, code, line });
      expect({ status: real.status, code: real.body.code, line: real.body.line }).toEqual({ status: 422, code, line });
    });

    it('refuses a Touchstone file of more than 100,000 points in the check and the upload alike, naming the line', async () => {
      const points = Array.from({ length: 100_001 }, (_, i) => `${1000 + i} 0.1 0`).join('\n');
      const { check, real } = await checkAndUpload('s11', 'long.s1p', `# kHz S RI R 50\n${points}\n`);
      expect(check.status).toBe(422);
      expect(check.body).toMatchObject({ code: 'TOUCHSTONE_TOO_MANY_POINTS', line: 100_002 });
      expect(real.body).toMatchObject({ code: 'TOUCHSTONE_TOO_MANY_POINTS', line: 100_002 });
    });

    it('refuses a CSV frequency that overflows in Hz, by row, in the check and the upload alike', async () => {
      const { check, real } = await checkAndUpload(
        'efficiency',
        'eff.csv',
        csvCurve('frequency (GHz),efficiency (%)', [
          [0.8, 40],
          [1e300, 50],
        ]),
      );
      expect(check.status).toBe(422);
      expect(check.body).toMatchObject({ code: 'CSV_BAD_ROWS', line: 3 });
      expect(real.body).toMatchObject({ code: 'CSV_BAD_ROWS', line: 3 });
    });

    it('still checks and stores a good passive S11 (|S11| up to 1)', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const file = s1pWithGamma([
        [800, 0.2],
        [850, 1],
        [900, 0.3],
      ]);
      await upload(draft.id, 's11', 'ok.s1p', file, { dryRun: 'true' }).expect(201);
      await upload(draft.id, 's11', 'ok.s1p', file).expect(201);
      expect(await storedOf(draft.id)).toEqual({ rows: 1, objects: 1 });
    });
  });

  describe('POST /api/parts/:id/documents', () => {
    it('sniffs a file of repeated empty comments in well under a second and refuses it as 415', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const started = Date.now();
      const res = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(auth())
        .field('kind', 'drawing')
        .attach('file', Buffer.from('<!---->'.repeat(36)), 'drawing.svg');
      expect(res.status).toBe(415);
      expect(Date.now() - started).toBeLessThan(5_000);
      expect(await storedOf(draft.id)).toEqual({ rows: 0, objects: 0 });
    });
  });

  describe('POST /api/parts/imports', () => {
    it('answers 422 PART_IMPORT_TOO_MANY_ROWS for a file of short rows under the byte limit, importing nothing', async () => {
      const res = await importCsv(`${IMPORT_HEADER}${'a,b,c,d,e,f\n'.repeat(300_000)}`, true);
      expect(res.status).toBe(422);
      expect(res.body).toMatchObject({ code: 'PART_IMPORT_TOO_MANY_ROWS', line: expect.any(Number) });
    });

    it('applies the checks of POST /api/parts to every row: dBi, MHz, band count, numbers; by row and column', async () => {
      const mpn = unique('IMP');
      const bands = Array.from({ length: 2000 }, (_, i) => `${i + 1}-${i + 2}`).join('; ');
      const text =
        IMPORT_HEADER +
        `Testbench Antennas,${mpn}-1,Gain,chip,solder-pad,linear,50,791-862 peak=1e300\n` +
        `Testbench Antennas,${mpn}-2,Range,chip,solder-pad,linear,50,791-999999999\n` +
        `Testbench Antennas,${mpn}-3,Bands,chip,solder-pad,linear,50,"${bands}"\n` +
        `Testbench Antennas,${mpn}-4,Impedance,chip,solder-pad,linear,1e300,\n` +
        `Testbench Antennas,${mpn}-5,Good,chip,solder-pad,linear,50,791-862 vswr=3\n`;
      const dry = await importCsv(text, true).expect(200);
      expect(dry.body).toMatchObject({ rowCount: 5, validRows: 1 });
      expect(dry.body.problems.map((p: { row: number; line: number; field: string }) => `${p.row}/${p.line}:${p.field}`)).toEqual([
        '1/2:specBands',
        '2/3:specBands',
        '3/4:specBands',
        '4/5:nominalImpedanceOhms',
      ]);
      const real = await importCsv(text, false).expect(422);
      expect(real.body.code).toBe('PART_IMPORT_INVALID');
      const [{ n }] = await db().query('SELECT COUNT(*) AS n FROM parts WHERE mpn LIKE ?', [`${mpn}%`]);
      expect(Number(n)).toBe(0);
    });
  });

  describe('POST /api/rf/touchstone/analyze', () => {
    const analyze = (content: string | Buffer, name: string) =>
      http()
        .post('/api/rf/touchstone/analyze')
        .set(auth())
        .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);

    it('lists at most 100 matched ranges and says how many there are', async () => {
      const points = Array.from({ length: 1000 }, (_, i) => `${800 + i} ${i % 2 === 0 ? 0.1 : 0.9} 0`).join('\n');
      const res = await analyze(`# MHz S RI R 50\n${points}\n`, 'noisy.s1p').expect(200);
      expect(res.body.matchedRanges).toHaveLength(100);
      expect(res.body.matchedRangeCount).toBe(500);
    });

    it('answers 422 with the line for a line past the length limit and for non-finite numbers', async () => {
      const long = await analyze(`# MHz S RI R 50\n800 0.1 0\n! ${'x'.repeat(20_000)}\n900 0.1 0\n`, 'long.s1p').expect(422);
      expect(long.body).toMatchObject({ code: 'TOUCHSTONE_LINE_TOO_LONG', line: 3 });
      const infinite = await analyze('# GHz S RI R 50\n0.8 0.1 0\n1e300 0.1 0\n', 'inf.s1p').expect(422);
      expect(infinite.body).toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', line: 3 });
    });
  });
});
