import type { Matrix } from '../types';

const CAUTION = 'Screening estimates from datasheet and measured data. Regulatory approval and RF exposure must be confirmed by an accredited lab and the local regulator; measure in the final enclosure.';

function quote(value: string | number): string {
  const text = String(value);
  return /[",\n;]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One line per (radio band × part) with status and findings; the caution comes first, as in the report. */
export function matrixToCsv(matrix: Matrix): string {
  const lines = [`# ${CAUTION}`, ['product', 'radio', 'band', 'ranges MHz', 'part', 'manufacturer', 'status', 'findings'].join(',')];
  for (const cell of matrix.cells) {
    const row = matrix.rows[cell.row];
    const column = matrix.columns[cell.column];
    const ranges = row.ranges.map((r) => `${r.fromMhz}-${r.toMhz} ${r.role}`).join(' / ');
    const findings = cell.findings.map((f) => `${f.severity} ${f.code}: ${f.message}`).join(' | ');
    lines.push([matrix.productName, row.radioName, row.designation, ranges, column.mpn, column.manufacturer, cell.status, findings].map(quote).join(','));
  }
  return lines.join('\n') + '\n';
}
