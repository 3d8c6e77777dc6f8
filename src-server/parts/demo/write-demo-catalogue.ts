import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { evenlySpacedFrequencies } from '../../rf/curves';
import { reflectionCurveFromGamma } from '../../rf/reflection';
import { writeTouchstone } from '../../rf/touchstone-writer';
import { figuresForRange } from '../catalogue/part-figures';
import { DEMO_PARTS, DEMO_SPEC_BASES, type DemoPart } from './demo-catalogue';
import { efficiencyAt, gainsAt, s11Curve } from './resonator-model';

/**
 * Writes catalog-seed/parts/: parts.json plus, per measured part, a Touchstone .s1p and efficiency,
 * peak-gain and average-gain CSVs from the resonator model, and a one-page invented datasheet PDF.
 * Run: node dist/server/parts/demo/write-demo-catalogue.js (the files are committed).
 */
export const SWEEP_POINTS = 301;

export interface DemoFiles {
  s1p: string;
  efficiencyCsv: string;
  peakGainCsv: string;
  averageGainCsv: string;
}

const number = (value: number) => String(Number(value.toPrecision(7)));

export function demoFiles(p: DemoPart): DemoFiles | null {
  if (!p.resonances || !p.efficiency || !p.sweep) return null;
  const frequenciesHz = [...evenlySpacedFrequencies(p.sweep[0] * 1e6, p.sweep[1] * 1e6, SWEEP_POINTS)];
  const gamma = s11Curve(p.resonances, frequenciesHz);
  const s1p = writeTouchstone({
    version: 1,
    ports: 1,
    frequencyUnit: 'MHz',
    format: 'RI',
    frequenciesHz,
    data: [gamma],
    formatNumber: number,
    comments: [`${p.manufacturer} ${p.mpn} - invented demo data (resonator model), not a measurement`, 'Bandwright demo catalogue'],
  });
  // Efficiency and gain are measured more coarsely than S11, as chamber sweeps usually are.
  const coarse = frequenciesHz.filter((_, i) => i % 6 === 0 || i === frequenciesHz.length - 1);
  const efficiency = coarse.map((f) => efficiencyAt(p.efficiency!, f));
  const gains = efficiency.map((e) => gainsAt(e, p.directivityDbi));
  const csv = (header: string, values: number[]) => [header, ...coarse.map((f, i) => `${number(f / 1e6)},${number(values[i])}`)].join('\n') + '\n';
  return {
    s1p,
    efficiencyCsv: csv('frequency (MHz),radiation efficiency (%)', efficiency),
    peakGainCsv: csv(
      'frequency (MHz),peak gain (dBi)',
      gains.map((g) => g.peakDbi),
    ),
    averageGainCsv: csv(
      'frequency (MHz),average gain (dBi)',
      gains.map((g) => g.averageDbi),
    ),
  };
}

/** A minimal valid one-page PDF with the part's name (PDF 1.4, ISO 32000-1 file structure). */
export function demoDatasheetPdf(p: DemoPart): Buffer {
  const text = `${p.manufacturer} ${p.mpn} - invented demo datasheet`.replace(/[()\\]/g, '');
  const stream = `BT /F1 14 Tf 50 780 Td (${text}) Tj ET`;
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>',
    `<< /Length ${stream.length} >>\nstream\n${stream}\nendstream`,
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
  ];
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((object, i) => {
    offsets.push(body.length);
    body += `${i + 1} 0 obj\n${object}\nendobj\n`;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n \n`).join('')}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}

export const fileStem = (p: DemoPart) => `${p.id}-${p.mpn}`;

/** The bands the demo story is told in (edges from catalog-seed/bands.json). */
const STORY_BANDS: [string, number, number][] = [
  ['B12', 699, 746],
  ['B13', 746, 787],
  ['B20', 791, 862],
  ['B8', 880, 960],
  ['B3', 1710, 1880],
  ['B2', 1850, 1990],
  ['B66', 1710, 2200],
  ['B7', 2500, 2690],
  ['GPS L1', 1565.19, 1585.65],
  ['2.4 GHz', 2400, 2483.5],
  ['UNII-3', 5725, 5850],
  ['EU868', 863, 870],
  ['US915', 902, 928],
];

function main(): void {
  const root = resolve(process.argv[2] ?? 'catalog-seed/parts');
  rmSync(join(root, 'curves'), { recursive: true, force: true });
  rmSync(join(root, 'documents'), { recursive: true, force: true });
  mkdirSync(join(root, 'curves'), { recursive: true });
  mkdirSync(join(root, 'documents'), { recursive: true });
  const manifest = DEMO_PARTS.map((p) => {
    const files = demoFiles(p);
    const stem = fileStem(p);
    const curves: { kind: string; file: string }[] = [];
    if (files) {
      writeFileSync(join(root, 'curves', `${stem}.s1p`), files.s1p);
      writeFileSync(join(root, 'curves', `${stem}-efficiency.csv`), files.efficiencyCsv);
      writeFileSync(join(root, 'curves', `${stem}-peak-gain.csv`), files.peakGainCsv);
      writeFileSync(join(root, 'curves', `${stem}-average-gain.csv`), files.averageGainCsv);
      curves.push(
        { kind: 's11', file: `curves/${stem}.s1p` },
        { kind: 'efficiency', file: `curves/${stem}-efficiency.csv` },
        { kind: 'peak-gain', file: `curves/${stem}-peak-gain.csv` },
        { kind: 'average-gain', file: `curves/${stem}-average-gain.csv` },
      );
    }
    const documents = p.datasheet ? [{ kind: 'datasheet', title: `${p.mpn} datasheet (invented)`, file: `documents/${stem}-datasheet.pdf` }] : [];
    if (p.datasheet) writeFileSync(join(root, 'documents', `${stem}-datasheet.pdf`), demoDatasheetPdf(p));
    const { resonances: _r, efficiency: _e, sweep: _s, directivityDbi: _d, ...meta } = p;
    return { ...meta, curves, documents };
  });
  writeFileSync(join(root, 'parts.json'), JSON.stringify(manifest, null, 1) + '\n');

  // The story the matrix will tell, from the generated curves themselves (worst VSWR / min efficiency per band).
  for (const p of DEMO_PARTS) {
    const files = demoFiles(p);
    const cells: string[] = [];
    for (const [name, from, to] of STORY_BANDS) {
      let curves;
      if (files) {
        const frequenciesHz = Float64Array.from(evenlySpacedFrequencies(p.sweep![0] * 1e6, p.sweep![1] * 1e6, SWEEP_POINTS));
        const g = s11Curve(p.resonances!, [...frequenciesHz]);
        const coarse = [...frequenciesHz].filter((_, i) => i % 6 === 0 || i === frequenciesHz.length - 1);
        curves = {
          s11: reflectionCurveFromGamma(frequenciesHz, Float64Array.from(g.re), Float64Array.from(g.im)),
          efficiencyPercent: { frequenciesHz: coarse, values: coarse.map((f) => efficiencyAt(p.efficiency!, f)) },
          peakGainDbi: null,
          averageGainDbi: null,
          specBands: [],
        };
      } else {
        curves = {
          s11: null,
          efficiencyPercent: null,
          peakGainDbi: null,
          averageGainDbi: null,
          specBands: p.specBands.map(([f, t, v, e, g]) => ({
            fromHz: f * 1e6,
            toHz: t * 1e6,
            maxVswr: v,
            minReturnLossDb: null,
            efficiencyPct: e,
            ...DEMO_SPEC_BASES,
            peakGainDbi: g,
            averageGainDbi: null,
          })),
        };
      }
      const fig = figuresForRange(curves, { fromHz: from * 1e6, toHz: to * 1e6 });
      if (fig.worstVswr === null) continue;
      cells.push(`${name} ${fig.worstVswr.toFixed(2)}/${fig.minEfficiencyPct?.toFixed(0) ?? '-'}%`);
    }
    console.log(`${p.id} ${p.mpn.padEnd(16)} ${p.reviewState.padEnd(10)} ${files ? 'measured' : 'spec    '} ${cells.join('  ')}`);
  }
}

if (require.main === module) main();
