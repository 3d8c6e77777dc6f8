import { getMetadataStorage, validateSync } from 'class-validator';
import { parse } from 'csv-parse/sync';
import { DomainError } from '../../common/domain-error';
import { flattenValidationErrors } from '../../common/validation';
import { type CsvBounds, csvParseLimits, firstLineBeyond } from '../csv-bounds';
import { CreatePartDto, SpecBandInputDto } from '../dto/part-input.dto';
import { EFFICIENCY_BASES, FIGURE_STATISTICS, GAIN_BASES } from '../part.types';

/** The import/export columns; the export adds id, review state, measured kinds and prices. */
export const PART_CSV_COLUMNS = [
  'manufacturer',
  'mpn',
  'title',
  'formFactor',
  'connector',
  'polarization',
  'mounting',
  'nominalImpedanceOhms',
  'lengthMm',
  'widthMm',
  'heightMm',
  'evalGroundLengthMm',
  'evalGroundWidthMm',
  'tempMinC',
  'tempMaxC',
  'lifecycle',
  'notes',
  'specBands',
] as const;
const REQUIRED = ['manufacturer', 'mpn', 'title', 'formFactor', 'connector', 'polarization'] as const;
/** Columns read as numbers; their ranges, like every other field check, are CreatePartDto's. */
const NUMERIC = new Set<string>(['nominalImpedanceOhms', 'lengthMm', 'widthMm', 'heightMm', 'evalGroundLengthMm', 'evalGroundWidthMm', 'tempMinC', 'tempMaxC']);
/** Most data rows of one import (a catalogue import is a few thousand rows). */
export const PART_IMPORT_MAX_ROWS = 5_000;
/** Room for quoted multi-line notes; a record holds at most 4,000 characters of notes and 64 spec bands. */
export const PART_IMPORT_CSV_BOUNDS: CsvBounds = { maxLines: 5 * PART_IMPORT_MAX_ROWS, maxRecordSize: 32 * 1024 };
const BAND_KEYS: Record<string, keyof SpecBandInputDto> = {
  vswr: 'maxVswr',
  rl: 'minReturnLossDb',
  eff: 'efficiencyPct',
  peak: 'peakGainDbi',
  avg: 'averageGainDbi',
};
/** Words, not numbers: what the figures include (see SpecBandInputDto); left out, the usual defaults apply. */
const BAND_WORD_KEYS: Record<string, { field: 'efficiencyBasis' | 'efficiencyStatistic' | 'gainBasis'; values: readonly string[] }> = {
  effbasis: { field: 'efficiencyBasis', values: EFFICIENCY_BASES },
  effstat: { field: 'efficiencyStatistic', values: FIGURE_STATISTICS },
  gainbasis: { field: 'gainBasis', values: GAIN_BASES },
};

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

/** `791-862 vswr=3 eff=45 effbasis=total effstat=average peak=1.5 avg=-2.5 gainbasis=peak; 880-960 vswr=3` → spec bands. */
export function parseSpecBandsText(text: string): { bands: SpecBandInputDto[]; error: string | null } {
  const bands: SpecBandInputDto[] = [];
  for (const [i, entry] of text
    .split(';')
    .map((e) => e.trim())
    .filter(Boolean)
    .entries()) {
    const [range, ...pairs] = entry.split(/\s+/);
    const match = /^(\d+(?:\.\d+)?)-(\d+(?:\.\d+)?)$/.exec(range);
    if (!match) return { bands, error: `band ${i + 1}: "${range}" is not a range in MHz like 791-862` };
    const band: SpecBandInputDto = { fromMhz: Number(match[1]), toMhz: Number(match[2]) };
    if (!(band.fromMhz < band.toMhz)) return { bands, error: `band ${i + 1}: ${range} must go from low to high` };
    for (const pair of pairs) {
      const [key, value] = pair.split('=');
      const word = BAND_WORD_KEYS[key?.toLowerCase()];
      if (word) {
        if (!word.values.includes(value)) return { bands, error: `band ${i + 1}: ${key}= must be one of ${word.values.join(', ')}` };
        (band as unknown as Record<string, string>)[word.field] = value;
        continue;
      }
      const field = BAND_KEYS[key?.toLowerCase()];
      if (!field || value === undefined || value === '' || !Number.isFinite(Number(value))) {
        return { bands, error: `band ${i + 1}: "${pair}" should be one of vswr=, rl=, eff=, peak=, avg= with a number, or effbasis=, effstat=, gainbasis=` };
      }
      (band as unknown as Record<string, number>)[field] = Number(value);
    }
    if (band.maxVswr !== undefined && band.maxVswr !== null && band.maxVswr < 1) return { bands, error: `band ${i + 1}: vswr must be at least 1` };
    if (band.efficiencyPct !== undefined && band.efficiencyPct !== null && (band.efficiencyPct < 0 || band.efficiencyPct > 100))
      return { bands, error: `band ${i + 1}: eff must be 0…100 %` };
    bands.push(band);
  }
  return { bands, error: null };
}

export function formatSpecBands(bands: readonly SpecBandInputDto[]): string {
  return bands
    .map((b) =>
      [
        `${b.fromMhz}-${b.toMhz}`,
        ...(Object.entries(BAND_KEYS) as [string, keyof SpecBandInputDto][]).flatMap(([key, field]) =>
          b[field] === null || b[field] === undefined ? [] : [`${key}=${b[field]}`],
        ),
        ...Object.entries(BAND_WORD_KEYS).flatMap(([key, { field }]) => (b[field] === undefined ? [] : [`${key}=${b[field]}`])),
      ].join(' '),
    )
    .join('; ');
}

/** 422 for a file too long to be an import, refused before it is parsed. */
function tooManyRows(line: number): DomainError {
  return new DomainError(
    'PART_IMPORT_TOO_MANY_ROWS',
    `line ${line}: an import may have at most ${PART_IMPORT_MAX_ROWS} rows; split the file, nothing was imported`,
    422,
    {
      field: 'file',
      line,
      limitRows: PART_IMPORT_MAX_ROWS,
    },
  );
}

/**
 * CreatePartDto's own @ArrayMaxSize for specBands, read from its metadata so the number lives in one place:
 * a row with more bands is refused before validation, whose cost grows with every band it is given.
 */
export const SPEC_BANDS_MAX: number = (() => {
  const rule = getMetadataStorage()
    .getTargetValidationMetadatas(CreatePartDto, '', true, false)
    .find((m) => m.propertyName === 'specBands' && m.name === 'arrayMaxSize');
  if (!rule) throw new Error('CreatePartDto.specBands has no @ArrayMaxSize');
  return Number(rule.constraints[0]);
})();

/**
 * The same checks as POST /api/parts (CreatePartDto with class-validator), reported with the CSV column.
 * The cells are already typed, so the instances are built directly: class-transformer's plainToInstance
 * would double the cost of a 5,000-row import for no change.
 */
function dtoProblems(input: Record<string, unknown>): { field: string; message: string }[] {
  const bands = input.specBands as SpecBandInputDto[] | undefined;
  const instance = Object.assign(new CreatePartDto(), input, bands ? { specBands: bands.map((band) => Object.assign(new SpecBandInputDto(), band)) } : {});
  const errors = validateSync(instance, { whitelist: true, forbidNonWhitelisted: true });
  return flattenValidationErrors(errors).map(({ field, message }) => {
    // specBands.3.peakGainDbi → column specBands, "band 4: peakGainDbi …", as the band text numbers them.
    const [column, index, property] = field.split('.');
    if (column === 'specBands' && index !== undefined)
      return { field: column, message: `band ${Number(index) + 1}: ${property ?? ''} ${message}`.replace(/\s+/g, ' ') };
    return { field: column, message };
  });
}

/** Every problem of every row, so the dry run shows them all before anything is written. */
export function parsePartCsv(bytes: Uint8Array): ParsedImport {
  const lineTooMany = firstLineBeyond(bytes, PART_IMPORT_CSV_BOUNDS.maxLines);
  if (lineTooMany !== null) throw tooManyRows(lineTooMany);
  let records: { record: Record<string, string>; info: { lines: number } }[];
  try {
    records = parse(Buffer.from(bytes), {
      columns: (header: string[]) => header.map((h) => h.trim()),
      info: true,
      skip_empty_lines: true,
      trim: true,
      bom: true,
      relax_column_count: true,
      ...csvParseLimits(PART_IMPORT_CSV_BOUNDS),
    });
  } catch (error) {
    const e = error as { message: string; lines?: number };
    return { parts: [], problems: [{ row: 0, line: e.lines ?? 1, field: '', message: e.message }] };
  }
  const problems: ImportProblem[] = [];
  const parts: ParsedImport['parts'] = [];
  if (records.length === 0) return { parts, problems: [{ row: 0, line: 1, field: '', message: 'the file has a header but no rows, or is empty' }] };
  if (records.length > PART_IMPORT_MAX_ROWS) throw tooManyRows(records[PART_IMPORT_MAX_ROWS].info.lines);
  const header = Object.keys(records[0].record);
  for (const column of header) {
    if (!(PART_CSV_COLUMNS as readonly string[]).includes(column))
      problems.push({ row: 0, line: 1, field: column, message: `unknown column; expected: ${PART_CSV_COLUMNS.join(', ')}` });
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
      if (NUMERIC.has(column)) {
        const number = Number(value);
        if (!Number.isFinite(number)) report(column, `"${value.slice(0, 40)}" is not a finite number`);
        else input[column] = number;
      } else if (column === 'specBands') {
        // Counted before parsing, so a row of thousands of bands costs one split, not thousands of checks.
        const bandCount = value.split(';').filter((entry) => entry.trim() !== '').length;
        if (bandCount > SPEC_BANDS_MAX) {
          report(column, `has ${bandCount} bands; at most ${SPEC_BANDS_MAX}`);
          continue;
        }
        const { bands, error } = parseSpecBandsText(value);
        if (error) report(column, error);
        else input.specBands = bands;
      } else {
        input[column] = value;
      }
    }
    // Only cells that read cleanly are judged by the DTO, so no column is reported twice.
    const alreadyReported = new Set(rowProblems.map((p) => p.field));
    for (const problem of dtoProblems(input)) if (!alreadyReported.has(problem.field)) report(problem.field, problem.message);
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
