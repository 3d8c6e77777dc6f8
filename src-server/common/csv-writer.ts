import { stringify } from 'csv-stringify/sync';

/** First characters on which a spreadsheet starts a formula (or, for tab and carriage return, hides one). */
const FORMULA_STARTS = new Set(['=', '+', '-', '@', '\t', '\r']);

/** A whole cell that is one plain number, as a spreadsheet reads it: sign, digits, fraction, exponent. */
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/** The text of one cell: a formula start gets a leading apostrophe, unless the cell is a plain number. */
export function csvCellText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (value instanceof Date) return value.toISOString();
  const text = typeof value === 'number' && !Number.isFinite(value) ? '' : String(value);
  if (text.length > 0 && FORMULA_STARTS.has(text[0]) && !PLAIN_NUMBER.test(text)) return `'${text}`;
  return text;
}

/**
 * The one way the server writes CSV: every cell through csvCellText, quoting by csv-stringify
 * (RFC 4180, CRLF line ends; a lone carriage return is quoted too). `lead` rows come before the header,
 * e.g. a caution that must travel with the figures.
 */
export function writeCsv(header: readonly string[], rows: Iterable<readonly unknown[]>, lead: readonly (readonly unknown[])[] = []): string {
  const records: string[][] = [];
  for (const row of lead) records.push(row.map(csvCellText));
  records.push(header.map(csvCellText));
  for (const row of rows) records.push(row.map(csvCellText));
  return stringify(records, { record_delimiter: 'windows', quoted_match: /[\r\n]/ });
}
