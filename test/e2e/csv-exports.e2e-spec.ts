import type { INestApplication } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { createApiApp, demoTokens, unique } from '../support/api-app';

const TRACKER = 1;
/** Cells a spreadsheet would run as formulas if written as they are. */
const HOSTILE_MPN = "-1+1+cmd|' /C calc'!A0";
const HOSTILE_TITLE = '=HYPERLINK("http://example.invalid","open me")';
const HOSTILE_RADIO = '@SUM(1+1)*cmd';

/** True when a cell, as a spreadsheet reads it, would start a formula. */
const startsFormula = (cell: string) => /^[=+@\t\r]/.test(cell) || (cell.startsWith('-') && Number.isNaN(Number(cell)));

describe('CSV exports (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });
  let partId: number;
  let mpn: string;
  let productId: number;

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    mpn = `${HOSTILE_MPN}${unique('')}`;
    const part = await http()
      .post('/api/parts')
      .set(as('engineer'))
      .send({
        manufacturer: '+Formula Antennas',
        mpn,
        title: HOSTILE_TITLE,
        formFactor: 'chip',
        connector: 'solder-pad',
        polarization: 'linear',
        notes: '\t=1+1',
      })
      .expect(201);
    partId = part.body.id;
    const bands = await http().get('/api/bands').query({ designation: 'BLE 2.4 GHz' }).set(as('engineer')).expect(200);
    const product = await http()
      .post('/api/products')
      .set(as('engineer'))
      .send({
        name: `=cmd ${unique('csv')}`,
        code: unique('CSV').slice(0, 40),
        owner: 'e2e',
        groundPlaneLengthMm: 62,
        groundPlaneWidthMm: 28,
        targetRegions: ['EU'],
      })
      .expect(201);
    productId = product.body.id;
    const radio = await http()
      .post(`/api/products/${productId}/radios`)
      .set(as('engineer'))
      .send({
        name: HOSTILE_RADIO,
        technology: 'ble',
        module: 'test module',
        transmitPowerDbm: 8,
        polarization: 'linear',
        connector: 'solder-pad',
        feedLossDb: 0.2,
        bands: [{ bandId: bands.body[0].id, certifiedMaxGainDbi: 2.5 }],
      })
      .expect(201);
    await http().post(`/api/products/${productId}/radios/${radio.body.id}/shortlist`).set(as('engineer')).send({ partId }).expect(201);
  }, 30_000);
  afterAll(() => app.close());

  describe('GET /api/products/:id/matrix.csv', () => {
    it('answers 401 without a token, and to every role', async () => {
      await http().get(`/api/products/${productId}/matrix.csv`).expect(401);
      for (const role of ['procurement', 'engineer', 'admin'] as const) await http().get(`/api/products/${productId}/matrix.csv`).set(as(role)).expect(200);
    });

    it('answers 404 for an unknown product and 400 naming "parts" for a malformed list', async () => {
      const missing = await http().get('/api/products/999999/matrix.csv').set(as('engineer')).expect(404);
      expect(missing.headers['content-type']).toMatch(/json/);
      expect(missing.body.code).toBe('PRODUCT_NOT_FOUND');
      expect((await http().get(`/api/products/${TRACKER}/matrix.csv`).query({ parts: '1,x' }).set(as('engineer')).expect(400)).body.fields[0].field).toBe(
        'parts',
      );
    });

    it('writes the caution, headers in words with units, and every hostile name neutralised', async () => {
      const res = await http().get(`/api/products/${productId}/matrix.csv`).set(as('procurement')).expect(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      expect(res.headers['content-disposition']).toMatch(/^attachment; filename="matrix-cmd-csv-[a-z0-9-]+\.csv"$/);
      const records: string[][] = parse(res.text, { relax_column_count: true });
      expect(records[0][0]).toMatch(/^# Screening estimates .*accredited lab/);
      expect(records[1]).toEqual(['Product', 'Radio', 'Band', 'Band ranges (MHz)', 'Manufacturer', 'Part number (MPN)', 'Part title', 'Status', 'Findings']);
      const line = records.find((r) => r[5] === `'${mpn}`)!;
      expect(line).toBeDefined();
      expect(line.slice(0, 7)).toEqual([
        expect.stringMatching(/^'=cmd /),
        `'${HOSTILE_RADIO}`,
        'BLE 2.4 GHz',
        expect.stringMatching(/MHz|tdd|–/),
        "'+Formula Antennas",
        `'${mpn}`,
        `'${HOSTILE_TITLE}`,
      ]);
      for (const record of records) for (const cell of record) expect(startsFormula(cell)).toBe(false);
    });

    it('writes the same cells as the matrix, in words', async () => {
      const matrix = (await http().get(`/api/products/${TRACKER}/matrix`).set(as('engineer')).expect(200)).body;
      const records: string[][] = parse((await http().get(`/api/products/${TRACKER}/matrix.csv`).set(as('engineer')).expect(200)).text, {
        relax_column_count: true,
      });
      expect(records).toHaveLength(2 + matrix.cells.length);
      expect(new Set(records.slice(2).map((r) => r[7]))).toEqual(
        new Set(matrix.cells.map((c: { status: string }) => (c.status === 'no-data' ? 'not checked (no data)' : c.status))),
      );
    });
  });

  describe('GET /api/parts/export', () => {
    it('answers a bad query with a JSON 400 naming the field, not a CSV', async () => {
      const res = await http()
        .get('/api/parts/export')
        .query({ q: 'x'.repeat(201) })
        .set(as('engineer'))
        .expect(400);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body.fields[0].field).toBe('q');
    });

    it('neutralises a hostile MPN, title, manufacturer and notes, and keeps plain negative numbers', async () => {
      const res = await http()
        .get('/api/parts/export')
        .query({ q: mpn.slice(-12) })
        .set(as('engineer'))
        .expect(200);
      const [header, ...rows]: string[][] = parse(res.text);
      const row = rows.find((r) => Number(r[header.indexOf('id')]) === partId)!;
      expect(row).toBeDefined();
      expect(row[header.indexOf('mpn')]).toBe(`'${mpn}`);
      expect(row[header.indexOf('title')]).toBe(`'${HOSTILE_TITLE}`);
      expect(row[header.indexOf('manufacturer')]).toBe("'+Formula Antennas");
      expect(row[header.indexOf('notes')]).toBe("'\t=1+1");
      for (const record of [header, ...rows]) for (const cell of record) expect(startsFormula(cell)).toBe(false);
    });
  });
});
