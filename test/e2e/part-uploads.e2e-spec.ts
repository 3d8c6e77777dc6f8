import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { createHash } from 'node:crypto';
import { DataSource } from 'typeorm';
import { getDataSourceToken } from '@nestjs/typeorm';
import { loadConfig } from '../../src-server/config/app-config';
import { writeTouchstone } from '../../src-server/rf/touchstone-writer';
import { createApiApp, demoTokens } from '../support/api-app';
import { basisFields, createDraft, csvCurve, s1pWithGamma } from '../support/parts';

type Role = 'admin' | 'engineer' | 'procurement';

describe('part measurements and documents (API)', () => {
  let app: INestApplication;
  let tokens: Record<Role, string>;
  let s3: S3Client;
  const config = loadConfig();
  const http = () => request(app.getHttpServer());
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  const objectsOf = async (partId: number) => {
    const res = await s3.send(new ListObjectsV2Command({ Bucket: config.s3.bucket, Prefix: `parts/${partId}/` }));
    return res.KeyCount ?? 0;
  };
  const rowsOf = async (partId: number) => {
    const ds = app.get<DataSource>(getDataSourceToken());
    const [m] = await ds.query('SELECT COUNT(*) AS n FROM part_measurements WHERE part_id = ?', [partId]);
    const [d] = await ds.query('SELECT COUNT(*) AS n FROM part_documents WHERE part_id = ?', [partId]);
    return Number(m.n) + Number(d.n);
  };
  const upload = (partId: number, role: Role, kind: string, name: string, content: string | Buffer, fields: Record<string, string> = {}) => {
    let req = http().post(`/api/parts/${partId}/measurements`).set(as(role)).field('kind', kind);
    // A test that names `basis` (even as '') sends its own; '' sends none.
    for (const [k, v] of Object.entries({ ...basisFields(kind), ...fields })) if (v !== '') req = req.field(k, v);
    return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);
  };

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
    it("refuses procurement, another engineer's draft, a missing file and an unknown kind", async () => {
      const adminDraft = await createDraft(app, tokens.admin);
      const file = s1pWithGamma([
        [800, 0.2],
        [900, 0.3],
      ]);
      expect((await upload(adminDraft.id, 'procurement', 's11', 'a.s1p', file).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      expect((await upload(adminDraft.id, 'engineer', 's11', 'a.s1p', file).expect(403)).body.code).toBe('PART_EDIT_FORBIDDEN');
      const none = await http().post(`/api/parts/${adminDraft.id}/measurements`).set(as('admin')).field('kind', 's11').expect(400);
      expect(none.body.fields[0].field).toBe('file');
      const kind = await upload(adminDraft.id, 'admin', 'vswr', 'a.s1p', file).expect(400);
      expect(kind.body.fields[0].field).toBe('kind');
      expect(await rowsOf(adminDraft.id)).toBe(0);
      expect(await objectsOf(adminDraft.id)).toBe(0);
    });

    it('stores a good .s1p: points in the database, the original in object storage; VSWR and return loss read back (invented 1-port example; VSWR and RL per Pozar 4th ed. §2.3)', async () => {
      const draft = await createDraft(app, tokens.engineer);
      // Invented 1-port example (Pozar 4th ed. §2.3 for the figures): 820 MHz |Γ| 0.5 → VSWR 3.0, RL 6.02 dB; 868 MHz 0.2 → 1.5, 13.98 dB; 915 MHz 0.3333 → 2.0, 9.54 dB.
      const file = '! Example A - invented data\n# MHz S RI R 50\n820   0.5000   0.0000\n868   0.2000   0.0000\n915   0.0000  -0.3333\n';
      const res = await upload(draft.id, 'engineer', 's11', 'example-a.s1p', file, {
        groundLengthMm: '80',
        groundWidthMm: '40',
        conditions: 'free space, 100 mm cable',
      }).expect(201);
      expect(res.body.measurement).toMatchObject({
        kind: 's11',
        pointCount: 3,
        fromMhz: 820,
        toMhz: 915,
        groundLengthMm: 80,
        groundWidthMm: 40,
        referenceOhms: 50,
        current: true,
      });
      expect(res.body.measurement.sha256).toBe(createHash('sha256').update(file).digest('hex'));
      expect(res.body.preview.values[0]).toBeCloseTo(6.02, 2);
      const points = await http().get(`/api/parts/${draft.id}/measurements/${res.body.measurement.id}/points`).set(as('procurement')).expect(200);
      expect(points.body.frequenciesHz).toEqual([820e6, 868e6, 915e6]);
      expect(points.body.vswr[0]).toBeCloseTo(3.0, 3);
      expect(points.body.vswr[1]).toBeCloseTo(1.5, 3);
      expect(points.body.vswr[2]).toBeCloseTo(2.0, 3);
      expect(points.body.returnLossDb[1]).toBeCloseTo(13.98, 2);
      expect(points.body.returnLossDb[2]).toBeCloseTo(9.54, 2);
      const original = await http()
        .get(`/api/parts/${draft.id}/measurements/${res.body.measurement.id}/file`)
        .set(as('procurement'))
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect((original.body as Buffer).toString()).toBe(file);
      expect(original.headers['content-disposition']).toMatch(/^attachment/);
      expect(await objectsOf(draft.id)).toBe(1);
    });

    it('reads port 1 of a version-1 .s2p (S21 before S12, Touchstone 1.1 spec)', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const file =
        '! Example B - invented data; columns S11 S21 S12 S22\n# GHz S MA R 50\n2.40  0.333 -30  0.90 -60  0.05 10  0.20 45\n2.45  0.100  15  0.91 -75  0.05  5  0.18 40\n';
      const res = await upload(draft.id, 'engineer', 's11', 'example-b.s2p', file).expect(201);
      expect(res.body.measurement).toMatchObject({ pointCount: 2, fromMhz: 2400, toMhz: 2450 });
      const points = await http().get(`/api/parts/${draft.id}/measurements/${res.body.measurement.id}/points`).set(as('engineer')).expect(200);
      expect(points.body.values[0]).toBeCloseTo(0.333, 6);
      expect(points.body.values[1]).toBeCloseTo(0.1, 6);
    });

    it('answers 422 { code, message, line } for a bad Touchstone file and stores nothing: no row, no object', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const bad = '! invented\n# MHz S RI R 50\n820 0.5 0.0\n868 0.2 zero\n915 0.1 0.0\n';
      const res = await upload(draft.id, 'engineer', 's11', 'bad.s1p', bad).expect(422);
      expect(res.body).toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', line: 4 });
      expect(res.body.message).toContain('line 4');
      const option = await upload(draft.id, 'engineer', 's11', 'bad.s1p', '# MHz S XX R 50\n820 0.5 0\n').expect(422);
      expect(option.body).toMatchObject({ code: 'TOUCHSTONE_BAD_OPTION_LINE', line: 1 });
      const ports = await upload(
        draft.id,
        'engineer',
        's11',
        'wrong.s2p',
        s1pWithGamma([
          [800, 0.2],
          [900, 0.3],
        ]),
      ).expect(422);
      expect(ports.body.code).toBe('TOUCHSTONE_WRONG_PORT_COUNT');
      expect(await rowsOf(draft.id)).toBe(0);
      expect(await objectsOf(draft.id)).toBe(0);
    });

    it('a dry run previews and stores nothing', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const res = await upload(
        draft.id,
        'engineer',
        's11',
        'a.s1p',
        s1pWithGamma([
          [800, 0.2],
          [850, 0.25],
          [900, 0.3],
        ]),
        { dryRun: 'true' },
      ).expect(201);
      expect(res.body.measurement).toBeNull();
      expect(res.body.preview).toMatchObject({ pointCount: 3, fromMhz: 800, toMhz: 900 });
      expect(await rowsOf(draft.id)).toBe(0);
      expect(await objectsOf(draft.id)).toBe(0);
    });

    it('efficiency CSV: units from the header, or from the form (dB converted to %: 10·log10(η), −3.01 dB = 50 %)', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const header = await upload(
        draft.id,
        'engineer',
        'efficiency',
        'eff.csv',
        csvCurve('frequency (MHz),efficiency (%)', [
          [700, 35],
          [800, 48],
          [900, 52],
        ]),
      ).expect(201);
      expect(header.body.measurement).toMatchObject({ kind: 'efficiency', pointCount: 3, sourceFormat: 'CSV, MHz, %' });
      const form = await upload(
        draft.id,
        'engineer',
        'efficiency',
        'eff-db.csv',
        csvCurve('f,eta', [
          [0.7, -3.0103],
          [0.9, -6.0206],
        ]),
        { frequencyUnit: 'GHz', valueUnit: 'dB' },
      ).expect(201);
      const points = await http().get(`/api/parts/${draft.id}/measurements/${form.body.measurement.id}/points`).set(as('engineer')).expect(200);
      expect(points.body.frequenciesHz).toEqual([700e6, 900e6]);
      expect(points.body.values[0]).toBeCloseTo(50, 2); // −3.01 dB = 50 % (definition of the decibel)
      expect(points.body.values[1]).toBeCloseTo(25.0, 2); // 25 % = −6.02 dB (10·log10(0.25))
      const ratio = await upload(
        draft.id,
        'engineer',
        'efficiency',
        'eff-ratio.csv',
        csvCurve('frequency_GHz,efficiency_ratio', [
          [0.7, 0.4],
          [0.9, 0.55],
        ]),
      ).expect(201);
      expect(ratio.body.preview.values[0]).toBeCloseTo(40, 9);
      expect(ratio.body.preview.values[1]).toBeCloseTo(55, 9);
    });

    it('refuses an efficiency or gain curve without its basis, or with the basis of the other kind, naming the field basis; nothing is stored', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const eff = csvCurve('frequency (MHz),efficiency (%)', [
        [700, 40],
        [800, 45],
      ]);
      const gain = csvCurve('frequency (MHz),peak gain (dBi)', [
        [700, 1],
        [800, 2],
      ]);
      const s11 = s1pWithGamma([
        [800, 0.2],
        [900, 0.3],
      ]);
      const fieldsOf = (body: { fields: { field: string }[] }) => body.fields.map((f) => f.field);
      for (const [kind, name, content, fields] of [
        ['efficiency', 'none.csv', eff, { basis: '' }],
        ['efficiency', 'none-check.csv', eff, { basis: '', dryRun: 'true' }],
        ['efficiency', 'peak.csv', eff, { basis: 'peak' }],
        ['efficiency', 'typo.csv', eff, { basis: 'radiated' }],
        ['peak-gain', 'none.csv', gain, { basis: '' }],
        ['peak-gain', 'total.csv', gain, { basis: 'total' }],
        ['average-gain', 'radiation.csv', gain, { basis: 'radiation' }],
        ['s11', 'basis.s1p', s11, { basis: 'total' }],
      ] as const) {
        const res = await upload(draft.id, 'engineer', kind, name, content, fields).expect(400);
        expect(res.body.code).toBe('VALIDATION_FAILED');
        expect(fieldsOf(res.body)).toEqual(['basis']);
      }
      expect(await rowsOf(draft.id)).toBe(0);
      expect(await objectsOf(draft.id)).toBe(0);
    });

    it('stores and shows the basis each curve states: radiation or total efficiency, peak or realized gain', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const eff = csvCurve('frequency (MHz),efficiency (%)', [
        [700, 40],
        [800, 45],
      ]);
      const radiation = await upload(draft.id, 'engineer', 'efficiency', 'r.csv', eff, { basis: 'radiation' }).expect(201);
      expect(radiation.body.measurement).toMatchObject({ kind: 'efficiency', basis: 'radiation' });
      const total = await upload(draft.id, 'engineer', 'efficiency', 't.csv', eff, { basis: 'total' }).expect(201);
      expect(total.body.measurement.basis).toBe('total');
      const realized = await upload(draft.id, 'engineer', 'peak-gain', 'g.csv', 'frequency (MHz),peak gain (dBi)\n700,1\n800,2\n', {
        basis: 'realized',
      }).expect(201);
      expect(realized.body.measurement).toMatchObject({ kind: 'peak-gain', basis: 'realized' });
      const s11 = await upload(
        draft.id,
        'engineer',
        's11',
        'a.s1p',
        s1pWithGamma([
          [800, 0.2],
          [900, 0.3],
        ]),
      ).expect(201);
      expect(s11.body.measurement.basis).toBeNull();
      const detail = await http().get(`/api/parts/${draft.id}`).set(as('engineer')).expect(200);
      expect(detail.body.measurements.map((m: { basis: string | null }) => m.basis).sort()).toEqual([null, 'radiation', 'realized', 'total'].sort());
      // The newest efficiency curve is the one figures and checks use, and the figures say what it includes.
      const figures = await http().get(`/api/parts/${draft.id}`).query({ ranges: '700-800' }).set(as('engineer')).expect(200);
      expect(figures.body.figures[0]).toMatchObject({ efficiencySource: 'measured', efficiencyBasis: 'total', minEfficiencyPct: 40 });
    });

    it('peak and average gain CSV in dBi', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const peak = await upload(
        draft.id,
        'engineer',
        'peak-gain',
        'peak.csv',
        csvCurve('frequency (MHz),peak gain (dBi)', [
          [2400, 1.8],
          [2450, 2.2],
          [2500, 2.0],
        ]),
      ).expect(201);
      expect(peak.body.measurement).toMatchObject({ kind: 'peak-gain', pointCount: 3 });
      const avg = await upload(
        draft.id,
        'engineer',
        'average-gain',
        'avg.csv',
        csvCurve('frequency (MHz),average gain (dBi)', [
          [2400, -2.5],
          [2500, -2.1],
        ]),
      ).expect(201);
      expect(avg.body.measurement.kind).toBe('average-gain');
      const detail = await http().get(`/api/parts/${draft.id}`).query({ ranges: '2400-2483.5' }).set(as('procurement')).expect(200);
      expect(detail.body.figures[0]).toMatchObject({ fromMhz: 2400, toMhz: 2483.5, peakGainDbi: 2.2, matchSource: 'no-data' });
      expect(detail.body.figures[0].averageGainDbi).toBeLessThan(-2.1);
    });

    it('bad CSV rows are reported by line and row, and nothing is stored; a missing or conflicting unit is named', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const text = 'frequency (MHz),efficiency (%)\n700,40\n750,forty\n690,45\n\n900,140\n950\n';
      const res = await upload(draft.id, 'engineer', 'efficiency', 'bad.csv', text).expect(422);
      expect(res.body.code).toBe('CSV_BAD_ROWS');
      expect(res.body.line).toBe(3);
      expect(res.body.rows.map((r: { line: number }) => r.line)).toEqual([3, 4, 6, 7]);
      expect(res.body.rows.map((r: { row: number }) => r.row)).toEqual([2, 3, 4, 5]);
      expect(res.body.rows[0].message).toMatch(/forty/);
      const missing = await upload(draft.id, 'engineer', 'efficiency', 'bare.csv', 'f,value\n700,40\n800,41\n').expect(422);
      expect(missing.body).toMatchObject({ code: 'CSV_UNIT_MISSING', line: 1 });
      const conflict = await upload(draft.id, 'engineer', 'efficiency', 'c.csv', 'frequency (MHz),efficiency (%)\n700,40\n800,41\n', {
        frequencyUnit: 'GHz',
      }).expect(422);
      expect(conflict.body.code).toBe('CSV_UNIT_CONFLICT');
      const gainUnit = await upload(draft.id, 'engineer', 'peak-gain', 'g.csv', 'frequency (MHz),gain (%)\n700,40\n800,41\n').expect(422);
      expect(gainUnit.body.code).toBe('CSV_UNIT_NOT_ALLOWED');
      expect(await rowsOf(draft.id)).toBe(0);
      expect(await objectsOf(draft.id)).toBe(0);
    });

    it('the newest curve of a kind is current; figures come from it; deleting removes row and object', async () => {
      const draft = await createDraft(app, tokens.engineer, { specBands: [{ fromMhz: 820, toMhz: 900, maxVswr: 3 }] });
      const first = await upload(
        draft.id,
        'engineer',
        's11',
        'a.s1p',
        s1pWithGamma([
          [800, 0.5],
          [900, 0.5],
        ]),
      ).expect(201);
      const second = await upload(
        draft.id,
        'engineer',
        's11',
        'b.s1p',
        s1pWithGamma([
          [800, 0.2],
          [850, 1 / 3],
          [900, 0.2],
        ]),
      ).expect(201);
      const detail = await http().get(`/api/parts/${draft.id}`).set(as('engineer')).expect(200);
      const current = detail.body.measurements.filter((m: { current: boolean }) => m.current).map((m: { id: number }) => m.id);
      expect(current).toEqual([second.body.measurement.id]);
      // Worst point 850 MHz, |Γ| = 1/3 → VSWR 2 (Pozar 4th ed. §2.3).
      expect(detail.body.figures[0]).toMatchObject({ matchSource: 'measured', worstVswrAtMhz: 850, coveredFractionVswr2: 1 });
      expect(detail.body.figures[0].worstVswr).toBeCloseTo(2, 9);
      await http().delete(`/api/parts/${draft.id}/measurements/${second.body.measurement.id}`).set(as('engineer')).expect(204);
      expect(await objectsOf(draft.id)).toBe(1);
      const after = await http().get(`/api/parts/${draft.id}`).set(as('engineer')).expect(200);
      expect(after.body.measurements.map((m: { id: number; current: boolean }) => [m.id, m.current])).toEqual([[first.body.measurement.id, true]]);
      expect(after.body.figures[0].worstVswr).toBeCloseTo(3, 9);
    });
  });

  describe('POST /api/parts/:id/documents', () => {
    const pdf = Buffer.from('%PDF-1.4\n% invented test datasheet\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

    it('stores a PDF by content with SHA-256 and size, and downloads the same bytes', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const res = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(as('engineer'))
        .field('kind', 'datasheet')
        .field('title', 'Datasheet rev B')
        .attach('file', pdf, 'datasheet.pdf')
        .expect(201);
      expect(res.body).toMatchObject({
        kind: 'datasheet',
        title: 'Datasheet rev B',
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
        sha256: createHash('sha256').update(pdf).digest('hex'),
      });
      const download = await http()
        .get(`/api/parts/${draft.id}/documents/${res.body.id}/file`)
        .set(as('procurement'))
        .buffer(true)
        .parse((r, cb) => {
          const c: Buffer[] = [];
          r.on('data', (x: Buffer) => c.push(x));
          r.on('end', () => cb(null, Buffer.concat(c)));
        })
        .expect(200);
      expect(Buffer.compare(download.body as Buffer, pdf)).toBe(0);
      expect(download.headers['content-type']).toMatch(/application\/pdf/);
      // Judged by content: a PNG named .pdf is stored as PNG.
      const drawing = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(as('engineer'))
        .field('kind', 'drawing')
        .attach('file', png, 'footprint.pdf')
        .expect(201);
      expect(drawing.body.contentType).toBe('image/png');
      const svg = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(as('engineer'))
        .field('kind', 'drawing')
        .attach('file', Buffer.from('<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg"></svg>'), 'outline.svg')
        .expect(201);
      expect(svg.body.contentType).toBe('image/svg+xml');
      expect(await objectsOf(draft.id)).toBe(3);
    });

    it('refuses content that is not a document type (415), an oversize file (413), and stores nothing', async () => {
      const draft = await createDraft(app, tokens.engineer);
      const fake = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(as('engineer'))
        .field('kind', 'datasheet')
        .attach('file', Buffer.from('MZ\x90\x00 not a pdf'), 'datasheet.pdf')
        .expect(415);
      expect(fake.body.code).toBe('DOCUMENT_TYPE_NOT_ALLOWED');
      const big = Buffer.concat([pdf, Buffer.alloc(20 * 1024 * 1024)]);
      const large = await http()
        .post(`/api/parts/${draft.id}/documents`)
        .set(as('engineer'))
        .field('kind', 'datasheet')
        .attach('file', big, 'huge.pdf')
        .expect(413);
      expect(large.body.code).toBe('DOCUMENT_TOO_LARGE');
      expect(await rowsOf(draft.id)).toBe(0);
      expect(await objectsOf(draft.id)).toBe(0);
    });
  });

  it('writeTouchstone round trip through the upload matches the RF writer input', async () => {
    const draft = await createDraft(app, tokens.engineer);
    const frequenciesHz = [700e6, 800e6, 900e6];
    const file = writeTouchstone({
      version: 2,
      ports: 1,
      frequencyUnit: 'MHz',
      format: 'DB',
      frequenciesHz,
      data: [{ re: [0.1, 0.2, 0.3], im: [0.1, 0, -0.1] }],
    });
    const res = await upload(draft.id, 'engineer', 's11', 'v2.ts', file).expect(201);
    expect(res.body.measurement.sourceFormat).toMatch(/Touchstone 2\.0/);
    const points = await http().get(`/api/parts/${draft.id}/measurements/${res.body.measurement.id}/points`).set(as('engineer')).expect(200);
    expect(points.body.values[0]).toBeCloseTo(Math.hypot(0.1, 0.1), 9);
  });
});
