import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { printable, type ProductReportInput, renderProductReport } from './product-report';

// The PDF is read back with poppler's pdftotext (Debian package poppler-utils), a reader independent of the writer.
function pdfText(pdf: Buffer): string {
  const dir = mkdtempSync(join(tmpdir(), 'bw-report-'));
  const file = join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}
const pageCount = (pdf: Buffer) => {
  const dir = mkdtempSync(join(tmpdir(), 'bw-report-'));
  const file = join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))![1]);
};

const facts = {
  coverageFraction: 1,
  worstVswr: 1.8,
  minTotalEfficiencyPct: 52.3,
  avgTotalEfficiencyPct: 60.1,
  minSystemEfficiencyPct: 45.6,
  peakGainDbi: 2.1,
  eirpDbm: 24.6,
};

function input(bandsPerRadio = 2): ProductReportInput {
  return {
    generatedAt: new Date('2026-12-02T09:30:00Z'),
    generatedBy: 'Erin Engineer',
    product: { id: 7, name: 'Meadow tracker', code: 'MT-1', version: 3, targetRegions: ['US', 'EU'], groundPlaneMm: { length: 80, width: 40 } },
    evaluation: {
      verdict: 'fail',
      radios: [
        {
          radioId: 1,
          name: 'Cellular modem',
          technology: 'lte',
          verdict: 'fail',
          chosen: [{ partId: 11, mpn: 'XA-100', manufacturer: 'Example Works', title: 'Flexible LTE antenna' }],
          bands: Array.from({ length: bandsPerRadio }, (_, i) => ({
            bandId: 100 + i,
            designation: `B${i + 1}`,
            verdict: i === 0 ? ('fail' as const) : ('pass' as const),
            decidingFinding:
              i === 0 ? { ruleId: 'band-coverage', severity: 'fail', code: 'BAND_NOT_COVERED', title: 'Band not covered', message: 'covers 0 % of B1' } : null,
            facts,
          })),
        },
        { radioId: 2, name: 'Satellite positioning', technology: 'gnss', verdict: 'no-data', chosen: [], bands: [] },
      ],
      findings: [{ code: 'MARKET_WITHOUT_BANDS', title: 'Market without bands', severity: 'info', message: 'no band of the radio is used in JP', radioId: 1 }],
    },
    rules: [{ id: 'band-coverage', name: 'Band coverage', version: 2, severity: 'fail' }],
    cautions: ['Screening estimate only; confirm regulatory approval and RF exposure with an accredited lab.'],
  };
}

describe('product report PDF', () => {
  it('carries the title, the date, the product verdict, each radio with its reason, the rules, the cautions and a sign-off block', async () => {
    const pdf = await renderProductReport(input());
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain('Antenna compatibility report');
    expect(text).toContain('Meadow tracker (MT-1)');
    expect(text).toContain('2026-12-02 09:30 UTC');
    expect(text).toContain('Product verdict: Fail');
    expect(text).toContain('Cellular modem');
    expect(text).toContain('Satellite positioning');
    expect(text).toContain('No antenna chosen for this radio.');
    expect(text).toMatch(/Band not covered: covers 0 % of\s+B1/);
    expect(text).toContain('Band coverage');
    expect(text).toContain('accredited lab');
    expect(text).toContain('Reviewed by (RF)');
    expect(text).toMatch(/Page 1 of \d+/);
  });

  it('flows a long band table over several pages, numbering every page', async () => {
    const pdf = await renderProductReport(input(120));
    if (process.env.REPORT_SAMPLE) writeFileSync(process.env.REPORT_SAMPLE, pdf);
    const pages = pageCount(pdf);
    expect(pages).toBeGreaterThan(2);
    const text = pdfText(pdf);
    expect(text).toContain(`Page ${pages} of ${pages}`);
    // The table header repeats on the pages the table runs onto.
    expect(text.split('Worst').length - 1).toBeGreaterThanOrEqual(pages - 1);
    expect(text).toContain('B120');
  });

  it('spells out the signs the shipped Latin font lacks', () => {
    expect(printable('VSWR ≤ 2, |Γ| ≈ 0.33, below λ/4')).toBe('VSWR <= 2, |Gamma| ~ 0.33, below lambda/4');
  });

  it('prints each coexistence finding with its numbers, the isolation needed and measured (or unknown), and the assumptions', async () => {
    const report = input();
    report.evaluation.radios.push({ radioId: 3, name: 'Satellite receiver', technology: 'gnss', verdict: 'marginal', chosen: [], bands: [] });
    report.evaluation.coexistence = [
      {
        aggressor: { radioId: 1, designation: 'B13' },
        victim: { radioId: 3, designation: 'GPS L1' },
        mechanism: 'harmonic',
        order: 2,
        fromMhz: 1554,
        toMhz: 1574,
        overlapMhz: 8.81,
        distanceMhz: 0,
        severity: 'marginal',
        requiredIsolationDb: 97.99,
        isolationDb: null,
      },
      {
        aggressor: { radioId: 1, designation: 'B3' },
        victim: { radioId: 3, designation: 'GPS L1' },
        mechanism: 'intermodulation',
        order: 3,
        fromMhz: 1500,
        toMhz: 1560,
        overlapMhz: 0,
        distanceMhz: 5.19,
        severity: 'fail',
        requiredIsolationDb: 60,
        isolationDb: 42.25,
      },
    ];
    report.coexistenceAssumptions = 'thermal noise -174 dBm/Hz, I/N -6 dB';
    report.evaluation.radios[0].bands[0].facts = { ...facts, detuningMarginDownPct: 3.14, detuningMarginUpPct: 1.5 };
    const text = pdfText(await renderProductReport(report)).replace(/\s+/g, ' ');
    expect(text).toContain('Radios disturbing each other');
    // Cells wrap inside their columns, so each figure is looked for on its own.
    for (const piece of [
      'Cellular modem, B13',
      '2nd-order',
      '1554–1574',
      'Satellite receiver,',
      '8.81 98.0 unknown Marginal',
      '3rd-order',
      '1500–1560',
      '5.19 gap 60.0 42.3 Fail',
    ])
      expect(text).toContain(piece);
    expect(text).toContain('thermal noise -174 dBm/Hz');
    expect(text).toContain('−3.1 / +1.5');
  });

  it('says so when no radio disturbs another', async () => {
    const text = pdfText(await renderProductReport({ ...input(), evaluation: { ...input().evaluation, coexistence: [] } }));
    expect(text).toContain('No transmitter of this product lands on or near');
  });
});
