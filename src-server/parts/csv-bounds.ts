/**
 * Limits every CSV parse of uploaded text gets, checked before csv-parse runs so that no file, however
 * it is shaped, makes the parser build millions of records.
 */
export interface CsvBounds {
  /** Most physical lines (header, comments and blank lines included). */
  readonly maxLines: number;
  /** Most characters in one record (csv-parse `max_record_size`). */
  readonly maxRecordSize: number;
}

const LF = 0x0a;
const CR = 0x0d;

/**
 * The 1-based line that goes past `maxLines`, or null when the file has no more lines than that.
 * One pass over the bytes, stopping at the first line too many; CRLF, LF and a lone CR each end a line.
 */
export function firstLineBeyond(bytes: Uint8Array, maxLines: number): number | null {
  let lines = 1;
  for (let i = 0; i < bytes.length; i++) {
    const c = bytes[i];
    if (c === LF || (c === CR && bytes[i + 1] !== LF)) {
      // A line break at the very end opens no new line.
      if (i === bytes.length - 1) break;
      lines++;
      if (lines > maxLines) return lines;
    }
  }
  return null;
}

/** csv-parse options that enforce the bounds as well (`to_line` never cuts a file that passed firstLineBeyond). */
export function csvParseLimits(bounds: CsvBounds): { to_line: number; max_record_size: number } {
  return { to_line: bounds.maxLines, max_record_size: bounds.maxRecordSize };
}
