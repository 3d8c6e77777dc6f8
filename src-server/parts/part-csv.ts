import { parse } from 'csv-parse/sync';
import { CONNECTORS, FORM_FACTORS, LIFECYCLES, POLARIZATIONS } from './part.types';
import type { CreatePartDto, SpecBandInputDto } from './dto/part-input.dto';

/** The import/export columns; the export adds id, review state, measured kinds and prices. */
export const PART_CSV_COLUMNS = [
  'manufacturer', 'mpn', 'title', 'formFactor', 'connector', 'polarization', 'mounting', 'nominalImpedanceOhms', 'lengthMm', 'widthMm', 'heightMm',
  'evalGroundLengthMm', 'evalGroundWidthMm', 'tempMinC', 'tempMaxC', 'lifecycle', 'notes', 'specBands',
] as const;
const REQUIRED = ['manufacturer', 'mpn', 'title', 'formFactor', 'connector', 'polarization'] as const;
const NUMERIC: Record<string, [number, number]> = {
  nominalImpedanceOhms: [1, 1000], lengthMm: [0, 5000], widthMm: [0, 5000], heightMm: [0, 5000], evalGroundLengthMm: [0, 5000],
  evalGroundWidthMm: [0, 5000], tempMinC: [-273, 500], tempMaxC: [-273, 500],
};
const LENGTHS: Record<string, number> = { manufacturer: 120, mpn: 80, title: 200, mounting: 80, notes: 4000 };
const ENUMS: Record<string, readonly string[]> = { formFactor: FORM_FACTORS, connector: CONNECTORS, polarization: POLARIZATIONS, lifecycle: LIFECYCLES };
const BAND_KEYS: Record<string, keyof SpecBandInputDto> = { vswr: 'maxVswr', rl: 'minReturnLossDb', eff: 'efficiencyPct', peak: 'peakGainDbi', avg: 'averageGainDbi' };

export interface ImportProblem {
  /** Data row, 1-based (the header is not counted). */
  row: number;
  /** Line in the file, 1-based. */
  line: number;
  field: string;
  message: string;
}

export interface ParsedImport {
  parts: { row: number; line: number; input: CreatePartDto }[];
  problems: ImportProblem[];
}

/** `791-862 vswr=3 eff=45 peak=1.5 avg=-2.5; 880-960 vswr=3` → spec bands. */
export function parseSpecBandsText(text: string): { bands: SpecBandInputDto[]; error: string | null } {
  const bands: SpecBandInputDto[] = [];
  for (const [i, entry] of text.split(';').map((e) => e.trim()).filter(Boolean).entries()) {
    const [range, ...pairs] = entry.split(/\s+/);
    const match = /^(\d+(?:\.\d+)?)-(\d+(?:\.\d+)?)$/.exec(range);
    if (!match) return { bands, error: `band ${i + 1}: "${range}" is not a range in MHz like 791-862` };
    const band: SpecBandInputDto = { fromMhz: Number(match[1]), toMhz: Number(match[2]) };
    if (!(band.fromMhz < band.toMhz)) return { bands, error: `band ${i + 1}: ${range} must go from low to high` };
    for (const pair of pairs) {
      const [key, value] = pair.split('=');
      const field = BAND_KEYS[key?.toLowerCase()];
      if (!field || value === undefined || value === '' || !Number.isFinite(Number(value))) {
        return { bands, error: `band ${i + 1}: "${pair}" should be one of vswr=, rl=, eff=, peak=, avg= with a number` };
      }
      (band as unknown as Record<string, number>)[field] = Number(value);
    }
    if (band.maxVswr !== undefined && band.maxVswr !== null && band.maxVswr < 1) return { bands, error: `band ${i + 1}: vswr must be at least 1` };
    if (band.efficiencyPct !== undefined && band.efficiencyPct !== null && (band.efficiencyPct < 0 || band.efficiencyPct > 100)) return { bands, error: `band ${i + 1}: eff must be 0…100 %` };
    bands.push(band);
  }
  return { bands, error: null };
}

export function formatSpecBands(bands: readonly SpecBandInputDto[]): string {
  return bands.map((b) => [
    `${b.fromMhz}-${b.toMhz}`,
    ...(Object.entries(BAND_KEYS) as [string, keyof SpecBandInputDto][]).flatMap(([key, field]) => (b[field] === null || b[field] === undefined ? [] : [`${key}=${b[field]}`])),
  ].join(' ')).join('; ');
}

/** Every problem of every row, so the dry run shows them all before anything is written. */
export function parsePartCsv(bytes: Uint8Array): ParsedImport {
  let records: { record: Record<string, string>; info: { lines: number } }[];
  try {
    records = parse(Buffer.from(bytes), { columns: (header: string[]) => header.map((h) => h.trim()), info: true, skip_empty_lines: true, trim: true, bom: true, relax_column_count: true });
  } catch (error) {
    const e = error as { message: string; lines?: number };
    return { parts: [], problems: [{ row: 0, line: e.lines ?? 1, field: '', message: e.message }] };
  }
  const problems: ImportProblem[] = [];
  const parts: ParsedImport['parts'] = [];
  if (records.length === 0) return { parts, problems: [{ row: 0, line: 1, field: '', message: 'the file has a header but no rows, or is empty' }] };
  const header = Object.keys(records[0].record);
  for (const column of header) {
    if (!(PART_CSV_COLUMNS as readonly string[]).includes(column)) problems.push({ row: 0, line: 1, field: column, message: `unknown column; expected: ${PART_CSV_COLUMNS.join(', ')}` });
  }
  for (const column of REQUIRED) if (!header.includes(column)) problems.push({ row: 0, line: 1, field: column, message: 'required column is missing' });
  if (problems.length) return { parts, problems };

  const seen = new Map<string, number>();
  records.forEach(({ record, info }, index) => {
    const row = index + 1;
    const line = info.lines;
    const rowProblems: ImportProblem[] = [];
    const report = (field: string, message: string) => rowProblems.push({ row, line, field, message });
    const input: Record<string, unknown> = {};
    for (const column of PART_CSV_COLUMNS) {
      const value = record[column] ?? '';
      if (value === '') {
        if ((REQUIRED as readonly string[]).includes(column)) report(column, 'is required');
        continue;
      }
      if (column in NUMERIC) {
        const number = Number(value);
        const [min, max] = NUMERIC[column];
        if (!Number.isFinite(number)) report(column, `"${value}" is not a number`);
        else if (number < min || number > max) report(column, `${number} is outside ${min}…${max}`);
        else input[column] = number;
      } else if (column in ENUMS) {
        if (!ENUMS[column].includes(value)) report(column, `"${value}" must be one of: ${ENUMS[column].join(', ')}`);
        else input[column] = value;
      } else if (column === 'specBands') {
        const { bands, error } = parseSpecBandsText(value);
        if (error) report(column, error);
        else input.specBands = bands;
      } else if (value.length > LENGTHS[column]) {
        report(column, `is ${value.length} characters; at most ${LENGTHS[column]}`);
      } else {
        input[column] = value;
      }
    }
    const key = `${String(record.manufacturer).toLowerCase()}\u0000${record.mpn}`;
    if (record.manufacturer && record.mpn) {
      if (seen.has(key)) report('mpn', `${record.mpn} of ${record.manufacturer} appears again (first in row ${seen.get(key)})`);
      else seen.set(key, row);
    }
    if (rowProblems.length) problems.push(...rowProblems);
    else parts.push({ row, line, input: input as unknown as CreatePartDto });
  });
  return { parts, problems };
}
