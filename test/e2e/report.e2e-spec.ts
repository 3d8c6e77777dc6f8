import type { INestApplication } from '@nestjs/common';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createApiApp, demoTokens } from '../support/api-app';

// Demo data (catalog-seed/products.json): the tracker and its three radios.
const TRACKER = 1;

/** Text of a PDF through poppler's pdftotext (Debian poppler-utils), a reader independent of the writer. */
function pdfText(pdf: Buffer): string {
  const file = join(mkdtempSync(join(tmpdir(), 'bw-report-e2e-')), 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}

const binary = (res: request.Response, callback: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
};

describe('product report PDF (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  it('is a dated PDF with the product verdict, each radio with its verdict and reason, the rules, the cautions and a sign-off block', async () => {
    const evaluation = (await http().get(`/api/products/${TRACKER}/evaluation`).set('Authorization', `Bearer ${tokens.engineer}`).expect(200)).body;
    const res = await http()
      .get(`/api/products/${TRACKER}/report.pdf`)
      .set('Authorization', `Bearer ${tokens.procurement}`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="bandwright-report-DEMO-LT1-\d{4}-\d{2}-\d{2}\.pdf"/);
    const pdf = res.body as Buffer;
    if (process.env.REPORT_SAMPLE) writeFileSync(process.env.REPORT_SAMPLE, pdf); // for looking at it
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain('Antenna compatibility report');
    expect(text).toContain('Livestock tracker (collar unit) (DEMO-LT1)');
    expect(text).toContain(new Date().toISOString().slice(0, 10));
    const words: Record<string, string> = { pass: 'Pass', marginal: 'Marginal', fail: 'Fail', 'no-data': 'Not checked' };
    expect(text).toContain(`Product verdict: ${words[evaluation.verdict]}`);
    for (const radio of evaluation.radios as { name: string; verdict: string }[]) {
      expect(text).toContain(radio.name);
      expect(text).toMatch(new RegExp(`${radio.name.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')} \\([^)]*\\): ${words[radio.verdict]}`));
    }
    expect(text).toContain('Rules applied');
    expect(text).toContain('accredited');
    expect(text).toContain('RF exposure');
    expect(text).toContain('Reviewed by (RF)');
    // The tracker's B13 uplink 2nd harmonic (2 × 777–787 MHz) on GPS L1, as the evaluation gives it (3GPP TS 36.101 Table 5.5-1).
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('Radios disturbing each other');
    expect(flat).toContain('1554–1574');
    expect(flat).toContain('Coexistence between the product');
    expect(text).toMatch(/Page 1 of \d+/);
  });

  it('answers 404 for an unknown product, 400 for a bad id and 401 without a token', async () => {
    expect((await http().get('/api/products/999999/report.pdf').set('Authorization', `Bearer ${tokens.engineer}`).expect(404)).body.code).toBeDefined();
    expect((await http().get('/api/products/abc/report.pdf').set('Authorization', `Bearer ${tokens.engineer}`).expect(400)).body.fields[0].field).toBe('id');
    await http().get(`/api/products/${TRACKER}/report.pdf`).expect(401);
  });
});
