import { writeCsv } from '../common/csv-writer';
import type { MatrixDto } from './dto/matrix.dto';

/** Travels with the figures, as on the screen and in the printed report. */
export const MATRIX_CSV_CAUTION =
  'Screening estimates from datasheet and measured data. Regulatory approval and RF exposure must be confirmed by an accredited lab and the local regulator; measure in the final enclosure.';

export const MATRIX_CSV_HEADER = [
  'Product',
  'Radio',
  'Band',
  'Band ranges (MHz)',
  'Manufacturer',
  'Part number (MPN)',
  'Part title',
  'Status',
  'Findings',
] as const;

const STATUS_WORDS: Record<string, string> = { pass: 'pass', marginal: 'marginal', fail: 'fail', 'no-data': 'not checked (no data)' };
const SEVERITY_WORDS: Record<string, string> = { fail: 'fail', marginal: 'marginal', info: 'note', 'no-data': 'not checked' };

/** One line per evaluated (radio band × part) pair with its state and findings in words; the caution comes first. */
export function matrixToCsv(matrix: MatrixDto): string {
  const rows = matrix.cells.map((cell) => {
    const row = matrix.rows[cell.row];
    const column = matrix.columns[cell.column];
    const ranges = row.ranges.map((r) => `${r.fromMhz}–${r.toMhz} ${r.role}`).join(' / ');
    // The short title for people, the code beside it for whoever filters the export.
    const findings = cell.findings.map((f) => `${SEVERITY_WORDS[f.severity] ?? f.severity}: ${f.title} [${f.code}]: ${f.message}`).join(' | ');
    return [
      matrix.productName,
      row.radioName,
      row.designation,
      ranges,
      column.manufacturer,
      column.mpn,
      column.title,
      STATUS_WORDS[cell.status] ?? cell.status,
      findings,
    ];
  });
  return writeCsv(MATRIX_CSV_HEADER, rows, [[`# ${MATRIX_CSV_CAUTION}`]]);
}

/** A file name of letters, digits and dashes only, so no header can be bent by a product name. */
export function matrixCsvFileName(productName: string): string {
  const slug = productName
    .normalize('NFKD')
    .replace(/[^A-Z0-9]+/gi, '-')
    .replace(/^-|-$/g, '')
    .toLowerCase()
    .slice(0, 80);
  return `matrix-${slug || 'product'}.csv`;
}
