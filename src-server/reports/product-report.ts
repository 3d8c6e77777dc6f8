import { dirname, join } from 'node:path';
import PDFDocument from 'pdfkit';

/** The verdict words a reader signs: never a bare code. */
export type ReportVerdict = 'pass' | 'marginal' | 'fail' | 'no-data';

export interface ReportFinding {
  ruleId: string;
  severity: string;
  code: string;
  title: string;
  message: string;
}

export interface ReportBandFacts {
  coverageFraction: number | null;
  worstVswr: number | null;
  minTotalEfficiencyPct: number | null;
  avgTotalEfficiencyPct: number | null;
  minSystemEfficiencyPct: number | null;
  peakGainDbi: number | null;
  eirpDbm: number | null;
  detuningMarginDownPct?: number | null;
  detuningMarginUpPct?: number | null;
}

/** One radio's transmitter landing on or near another radio's receiver, as the evaluation gives it. */
export interface ReportCoexistence {
  aggressor: { radioId: number; designation: string };
  secondAggressor?: { radioId: number; designation: string } | null;
  victim: { radioId: number; designation: string };
  mechanism: 'harmonic' | 'intermodulation' | 'adjacent';
  order: number;
  fromMhz: number;
  toMhz: number;
  overlapMhz: number;
  distanceMhz: number;
  severity: string;
  requiredIsolationDb: number;
  isolationDb: number | null;
}

/** The product evaluation as GET /api/products/:id/evaluation returns it (the fields the report prints). */
export interface ReportEvaluation {
  verdict: ReportVerdict;
  radios: Array<{
    radioId: number;
    name: string;
    technology: string;
    verdict: ReportVerdict;
    /** The radio's deciding reason in words, as the evaluation gives it. */
    reason?: string;
    chosen: Array<{ partId: number; mpn: string; manufacturer?: string | null; title?: string | null; role?: string; s11Source?: string }>;
    bands: Array<{ bandId: number; designation: string; verdict: ReportVerdict; decidingFinding: ReportFinding | null; facts: ReportBandFacts }>;
  }>;
  findings: Array<Partial<ReportFinding> & { message: string; radioId?: number | null }>;
  coexistence?: ReportCoexistence[];
}

export interface ProductReportInput {
  generatedAt: Date;
  generatedBy: string;
  product: { id: number; name: string; code: string; version: number; targetRegions: string[]; groundPlaneMm: { length: number; width: number } };
  evaluation: ReportEvaluation;
  rules: Array<{ id: string; name: string; version: number; severity: string }>;
  /** How the required isolation of a coexistence finding is worked out, printed beside the figures. */
  coexistenceAssumptions?: string;
  cautions: string[];
}

// The same words as the band library screen.
const TECHNOLOGY_WORDS: Record<string, string> = {
  lte: 'LTE',
  nr: '5G NR',
  gnss: 'GNSS',
  wifi: 'Wi-Fi',
  ble: 'Bluetooth LE',
  ism: 'Sub-GHz ISM / LoRaWAN',
  uwb: 'UWB',
  other: 'Other',
};
const SEVERITY_WORDS: Record<string, string> = { fail: 'Fail', marginal: 'Marginal', info: 'Information', 'no-data': 'Not checked' };
const severityWords = (severity: string | undefined) => (severity ? (SEVERITY_WORDS[severity] ?? severity) : '');
const technologyWords = (technology: string) => TECHNOLOGY_WORDS[technology] ?? technology;

export const VERDICT_WORDS: Record<ReportVerdict, string> = {
  pass: 'Pass',
  marginal: 'Marginal',
  fail: 'Fail',
  'no-data': 'Not checked',
};

const VERDICT_SENTENCES: Record<ReportVerdict, string> = {
  pass: 'Every radio is served by its chosen antennas on every band checked.',
  marginal: 'Every radio is served, but at least one band is close to a limit.',
  fail: 'At least one radio is not served by its chosen antennas.',
  'no-data': 'At least one radio or band could not be checked: data is missing.',
};

// Printed as a document: muted colours, one accent per verdict, black text.
const VERDICT_COLOURS: Record<ReportVerdict, string> = { pass: '#1d6b3a', marginal: '#8a5a00', fail: '#a3262a', 'no-data': '#55606e' };
const RULE_GREY = '#b8bec6';
const HEADER_FILL = '#eef1f4';
const PAGE = { size: 'A4' as const, margin: 54 };

const FONT_DIR = join(dirname(require.resolve('@fontsource/noto-sans/package.json')), 'files');
const FONTS = { regular: join(FONT_DIR, 'noto-sans-latin-400-normal.woff'), bold: join(FONT_DIR, 'noto-sans-latin-700-normal.woff') };

/** The shipped font covers Latin only; the few mathematical signs the product uses are spelled out. */
export function printable(text: string): string {
  return text
    .replace(/≤/g, '<=')
    .replace(/≥/g, '>=')
    .replace(/Γ/g, 'Gamma')
    .replace(/λ/g, 'lambda')
    .replace(/η/g, 'eta')
    .replace(/≈/g, '~')
    .replace(/→/g, '->');
}

const fixed = (value: number | null | undefined, digits: number) =>
  value === null || value === undefined || !Number.isFinite(value) ? '–' : value.toFixed(digits);
const percent = (fraction: number | null | undefined) => (fraction === null || fraction === undefined ? '–' : (fraction * 100).toFixed(0));

/** ISO 8601 date and time in UTC, the one format Bandwright's files use. */
export const reportTimestamp = (date: Date) => `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

interface Column {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

/** A design-review document: summary, one section per radio, findings, rules used, cautions, sign-off, page numbers. */
export function renderProductReport(input: ProductReportInput): Promise<Buffer> {
  const doc = new PDFDocument({
    size: PAGE.size,
    margins: { top: PAGE.margin, bottom: PAGE.margin + 18, left: PAGE.margin, right: PAGE.margin },
    bufferPages: true,
    info: {
      Title: printable(`Antenna compatibility report: ${input.product.name}`),
      Author: printable(input.generatedBy),
      Subject: `Product ${input.product.code}, version ${input.product.version}`,
      Creator: 'Bandwright',
      CreationDate: input.generatedAt,
    },
  });
  doc.registerFont('regular', FONTS.regular);
  doc.registerFont('bold', FONTS.bold);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const left = doc.page.margins.left;
  const contentWidth = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  const ensureRoom = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const text = (value: string, options: PDFKit.Mixins.TextOptions = {}) => doc.text(printable(value), options);
  const heading = (value: string, size = 13) => {
    ensureRoom(size * 3 + 60); // a heading never ends a page alone
    doc.moveDown(0.8).font('bold').fontSize(size).fillColor('black');
    text(value, { width: contentWidth });
    doc.moveDown(0.3).font('regular').fontSize(9.5);
  };
  const rule = () => {
    doc
      .moveTo(left, doc.y)
      .lineTo(left + contentWidth, doc.y)
      .lineWidth(0.5)
      .strokeColor(RULE_GREY)
      .stroke();
  };

  const table = (columns: Column[], rows: string[][], colourOf?: (row: number, column: number) => string | undefined, fontSize = 8.5) => {
    const scale = contentWidth / columns.reduce((sum, c) => sum + c.width, 0);
    const widths = columns.map((c) => c.width * scale);
    const pad = 3;
    const rowHeight = (cells: string[], font: string) => {
      doc.font(font).fontSize(fontSize);
      return Math.max(...cells.map((cell, i) => doc.heightOfString(printable(cell), { width: widths[i] - 2 * pad }))) + 2 * pad;
    };
    const drawRow = (cells: string[], font: string, fill?: string, rowIndex?: number) => {
      const height = rowHeight(cells, font);
      const top = doc.y;
      if (fill) doc.rect(left, top, contentWidth, height).fill(fill);
      let x = left;
      cells.forEach((cell, i) => {
        const colour = rowIndex === undefined ? undefined : colourOf?.(rowIndex, i);
        doc
          .font(colour ? 'bold' : font)
          .fontSize(fontSize)
          .fillColor(colour ?? 'black')
          .text(printable(cell), x + pad, top + pad, { width: widths[i] - 2 * pad, align: columns[i].align ?? 'left' });
        x += widths[i];
      });
      doc.x = left;
      doc.y = top + height;
      doc
        .moveTo(left, doc.y)
        .lineTo(left + contentWidth, doc.y)
        .lineWidth(0.4)
        .strokeColor(RULE_GREY)
        .stroke();
    };
    const header = columns.map((c) => c.header);
    ensureRoom(rowHeight(header, 'bold') + rowHeight(rows[0] ?? header, 'regular'));
    drawRow(header, 'bold', HEADER_FILL);
    rows.forEach((cells, index) => {
      if (doc.y + rowHeight(cells, 'regular') > bottom()) {
        doc.addPage();
        drawRow(header, 'bold', HEADER_FILL); // the header repeats on every page a table runs onto
      }
      drawRow(cells, 'regular', undefined, index);
    });
    doc.font('regular').fontSize(9.5).fillColor('black');
    doc.moveDown(0.5);
  };

  const { product, evaluation } = input;

  // Title block
  doc.font('bold').fontSize(20).fillColor('black');
  text('Antenna compatibility report');
  doc.font('regular').fontSize(12.5);
  text(`${product.name} (${product.code}), product version ${product.version}`);
  doc.fontSize(9.5).fillColor('#333333');
  text(`Generated ${reportTimestamp(input.generatedAt)} by ${input.generatedBy}. The figures are those on file at that moment.`);
  doc.moveDown(0.6);
  rule();
  doc.moveDown(0.6);

  // Summary
  doc.font('bold').fontSize(14).fillColor(VERDICT_COLOURS[evaluation.verdict]);
  text(`Product verdict: ${VERDICT_WORDS[evaluation.verdict]}`);
  doc.font('regular').fontSize(10).fillColor('black');
  text(VERDICT_SENTENCES[evaluation.verdict]);
  doc.moveDown(0.4).fontSize(9.5);
  text(`Target markets: ${product.targetRegions.length > 0 ? product.targetRegions.join(', ') : 'none given'}`);
  text(`Ground plane of the product: ${fixed(product.groundPlaneMm.length, 0)} × ${fixed(product.groundPlaneMm.width, 0)} mm`);

  heading('Radios');
  table(
    [
      { header: 'Radio', width: 16 },
      { header: 'Technology', width: 14 },
      { header: 'Chosen antenna', width: 18 },
      { header: 'Verdict', width: 10 },
      { header: 'Deciding reason', width: 42 },
    ],
    evaluation.radios.map((radio) => [
      radio.name,
      technologyWords(radio.technology),
      radio.chosen.length > 0 ? radio.chosen.map((c) => c.mpn).join(', ') : 'none chosen',
      VERDICT_WORDS[radio.verdict],
      radioReason(radio, evaluation),
    ]),
    (row, column) => (column === 3 ? VERDICT_COLOURS[evaluation.radios[row].verdict] : undefined),
  );

  for (const radio of evaluation.radios) {
    heading(`${radio.name} (${technologyWords(radio.technology)}): ${VERDICT_WORDS[radio.verdict]}`, 12);
    text(
      radio.chosen.length > 0
        ? `Chosen: ${radio.chosen
            .map((c) =>
              [
                c.role && radio.chosen.length > 1 ? `${ROLE_WORDS[c.role] ?? c.role}:` : '',
                c.manufacturer,
                c.mpn,
                c.title ? `(${c.title})` : '',
                s11Note(c.s11Source),
              ]
                .filter(Boolean)
                .join(' '),
            )
            .join('; ')}`
        : 'No antenna is chosen for this radio, so none of its bands could be checked.',
      { width: contentWidth },
    );
    doc.moveDown(0.3);
    if (radio.bands.length === 0) {
      text('This radio has no bands.', { width: contentWidth });
      continue;
    }
    table(
      [
        { header: 'Band', width: 8 },
        { header: 'Verdict', width: 9 },
        { header: 'Reason', width: 21 },
        { header: 'Covered (%)', width: 8, align: 'right' },
        { header: 'Worst VSWR', width: 7, align: 'right' },
        { header: 'Lowest total efficiency (%)', width: 10, align: 'right' },
        { header: 'Lowest at radio port (%)', width: 9, align: 'right' },
        { header: 'Peak gain (dBi)', width: 7, align: 'right' },
        { header: 'EIRP (dBm)', width: 8, align: 'right' },
        { header: 'Detuning margin (%)', width: 13, align: 'right' },
      ],
      radio.bands.map((band) => [
        band.designation,
        VERDICT_WORDS[band.verdict],
        band.decidingFinding ? `${band.decidingFinding.title}: ${band.decidingFinding.message}` : 'Every check passed.',
        percent(band.facts.coverageFraction),
        fixed(band.facts.worstVswr, 2),
        fixed(band.facts.minTotalEfficiencyPct, 1),
        fixed(band.facts.minSystemEfficiencyPct, 1),
        fixed(band.facts.peakGainDbi, 1),
        fixed(band.facts.eirpDbm, 1),
        detuning(band.facts),
      ]),
      (row, column) => (column === 1 ? VERDICT_COLOURS[radio.bands[row].verdict] : undefined),
      7.5, // ten columns: a smaller type keeps each header word whole
    );
  }

  const productFindings = evaluation.findings.filter((f) => f.message);
  if (productFindings.length > 0) {
    heading('Findings for the product and its markets');
    table(
      [
        { header: 'Finding', width: 25 },
        { header: 'Severity', width: 12 },
        { header: 'Details', width: 63 },
      ],
      productFindings.map((f) => [f.title ?? f.code ?? '', severityWords(f.severity), f.message]),
    );
  }

  const coexistence = evaluation.coexistence ?? [];
  heading('Radios disturbing each other');
  if (coexistence.length === 0) {
    text("No transmitter of this product lands on or near another radio's receive band (harmonics, intermodulation and band edges checked).", {
      width: contentWidth,
    });
  } else {
    const radioName = (id: number) => evaluation.radios.find((r) => r.radioId === id)?.name ?? `radio ${id}`;
    const end = (e: { radioId: number; designation: string }) => `${radioName(e.radioId)}, ${e.designation}`;
    table(
      [
        { header: 'From (transmitter)', width: 18 },
        { header: 'Mechanism', width: 15 },
        { header: 'Range (MHz)', width: 12, align: 'right' },
        { header: 'Onto (receiver)', width: 17 },
        { header: 'Overlap or gap (MHz)', width: 10, align: 'right' },
        { header: 'Isolation needed (dB)', width: 9, align: 'right' },
        { header: 'Isolation measured (dB)', width: 10, align: 'right' },
        { header: 'Severity', width: 9 },
      ],
      coexistence.map((c) => [
        c.secondAggressor ? `${end(c.aggressor)} with ${end(c.secondAggressor)}` : end(c.aggressor),
        mechanismWords(c),
        `${trimmed(c.fromMhz)}–${trimmed(c.toMhz)}`,
        end(c.victim),
        c.overlapMhz > 0 ? `${trimmed(c.overlapMhz)} overlap` : `${trimmed(c.distanceMhz)} gap`,
        fixed(c.requiredIsolationDb, 1),
        c.isolationDb === null ? 'unknown' : fixed(c.isolationDb, 1),
        severityWords(c.severity),
      ]),
      (row, column) => (column === 7 ? VERDICT_COLOURS[coexistence[row].severity as ReportVerdict] : undefined),
      7.5,
    );
  }
  if (input.coexistenceAssumptions) {
    doc.moveDown(0.3);
    doc.fontSize(8).fillColor('#444444');
    text(`How the isolation needed is worked out: ${input.coexistenceAssumptions}`, { width: contentWidth });
    doc.fontSize(9.5).fillColor('black');
  }

  heading('Rules applied');
  text('The verdicts above come from these rules, at the versions in force when the report was generated.', { width: contentWidth });
  doc.moveDown(0.3);
  table(
    [
      { header: 'Rule', width: 60 },
      { header: 'Severity', width: 15 },
      { header: 'Version', width: 10, align: 'right' },
    ],
    input.rules.map((r) => [r.name, severityWords(r.severity), String(r.version)]),
  );

  heading('Cautions');
  for (const caution of input.cautions) {
    text(`• ${caution}`, { width: contentWidth });
    doc.moveDown(0.2);
  }

  // Sign-off: three roles, each with name, signature and date lines, kept together on one page.
  ensureRoom(230); // the heading and the three boxes stay on one page
  heading('Review and sign-off');
  const roles = ['Prepared by', 'Reviewed by (RF)', 'Approved by'];
  const boxWidth = (contentWidth - 24) / 3;
  const top = doc.y + 4;
  roles.forEach((role, i) => {
    const x = left + i * (boxWidth + 12);
    doc.rect(x, top, boxWidth, 130).lineWidth(0.6).strokeColor(RULE_GREY).stroke();
    doc
      .font('bold')
      .fontSize(9.5)
      .fillColor('black')
      .text(role, x + 8, top + 8, { width: boxWidth - 16 });
    ['Name', 'Signature', 'Date'].forEach((line, j) => {
      const y = top + 44 + j * 30;
      doc
        .moveTo(x + 8, y)
        .lineTo(x + boxWidth - 8, y)
        .lineWidth(0.4)
        .strokeColor('#777777')
        .stroke();
      doc
        .font('regular')
        .fontSize(7.5)
        .fillColor('#555555')
        .text(line, x + 8, y + 2, { width: boxWidth - 16 });
    });
  });
  doc.x = left;
  doc.y = top + 140;

  // Footer with page numbers, written once every page exists.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const footerY = doc.page.height - PAGE.margin;
    doc.page.margins.bottom = 0; // writing inside the bottom margin must not open a new page
    doc
      .font('regular')
      .fontSize(8)
      .fillColor('#555555')
      .text(printable(`Bandwright · ${product.name} (${product.code}) · ${reportTimestamp(input.generatedAt)}`), left, footerY, {
        width: contentWidth * 0.75,
        lineBreak: false,
      })
      .text(`Page ${i - range.start + 1} of ${range.count}`, left + contentWidth * 0.75, footerY, {
        width: contentWidth * 0.25,
        align: 'right',
        lineBreak: false,
      });
  }
  doc.end();
  return done;
}

const ROLE_WORDS: Record<string, string> = { main: 'Main', diversity: 'Diversity', 'mimo-2': 'MIMO 2', 'mimo-3': 'MIMO 3', 'mimo-4': 'MIMO 4' };
const s11Note = (source: string | undefined) => (source && source !== 'evaluation board' ? `[S11 ${source}]` : '');
const trimmed = (mhz: number) => String(Math.round(mhz * 1000) / 1000);
const ORDINALS = ['', '1st', '2nd', '3rd', '4th', '5th', '6th', '7th', '8th', '9th', '10th'];
function mechanismWords(c: ReportCoexistence): string {
  if (c.mechanism === 'adjacent') return 'Transmit band edge';
  return `${ORDINALS[c.order] ?? `${c.order}th`}-order ${c.mechanism === 'harmonic' ? 'harmonic' : 'intermodulation'}`;
}
/** "−3.1 / +2.4": how far the S11 may shift down and up before the band fails its VSWR limit. */
function detuning(facts: ReportBandFacts): string {
  const down = facts.detuningMarginDownPct;
  const up = facts.detuningMarginUpPct;
  if ((down === null || down === undefined) && (up === null || up === undefined)) return '–';
  return `−${fixed(down, 1)} / +${fixed(up, 1)}`;
}

/** The radio's deciding reason in words: its worst band's finding, or why nothing could be checked. */
function radioReason(radio: ReportEvaluation['radios'][number], evaluation: ReportEvaluation): string {
  if (radio.chosen.length === 0) return 'No antenna chosen for this radio.';
  if (radio.reason) return radio.reason.charAt(0).toUpperCase() + radio.reason.slice(1);
  const order: ReportVerdict[] = ['fail', 'no-data', 'marginal'];
  for (const verdict of order) {
    const band = radio.bands.find((b) => b.verdict === verdict && b.decidingFinding);
    if (band && band.decidingFinding) return `${band.designation}: ${band.decidingFinding.title}: ${band.decidingFinding.message}`;
  }
  const radioFinding = evaluation.findings.find((f) => f.radioId === radio.radioId);
  if (radioFinding) return radioFinding.message;
  return radio.verdict === 'pass' ? 'Every band passes every check.' : '–';
}
