import { parse } from 'csv-parse/sync';
import { DomainError } from '../../common/domain-error';
import { withTouchstoneStatus } from '../../common/touchstone-http-error';
import { reflectionCurveFromNetwork } from '../../rf/reflection';
import { FREQUENCY_UNIT_HZ, type FrequencyUnit, portsFromFileName, readTouchstone } from '../../rf/touchstone';
import { efficiencyDbToPercent } from '../../rf/units';
import { type CsvBounds, csvParseLimits, firstLineBeyond } from '../csv-bounds';
import type { MeasurementKind } from '../part.types';

/** A curve ready to store: s11 as Re/Im of Γ, efficiency in %, gains in dBi. */
export interface ParsedCurve {
  kind: MeasurementKind;
  sourceFormat: string;
  referenceOhms: number | null;
  frequenciesHz: Float64Array;
  valuesA: Float64Array;
  valuesB: Float64Array | null;
  /** The 1-based file line of each point, so every later check names its line. */
  lines: Int32Array;
}

export const VALUE_UNITS = ['%', 'dB', 'ratio', 'dBi'] as const;
export type ValueUnit = (typeof VALUE_UNITS)[number];
export const FREQUENCY_UNITS: FrequencyUnit[] = ['Hz', 'kHz', 'MHz', 'GHz'];

/** Most points of a stored curve, Touchstone or CSV. */
export const MEASUREMENT_MAX_POINTS = 100_000;
const MAX_REPORTED_ROWS = 50;
/**
 * Largest |S11| stored: a passive antenna reflects at most what it receives (|S11| ≤ 1); the small margin
 * is for measurement noise near total reflection (common practice, from memory: a few thousandths).
 */
export const PASSIVE_REFLECTION_LIMIT = 1.005;
/** Room for a header, comments and blank lines around the largest curve; a data row is far under 1 KiB. */
export const CURVE_CSV_BOUNDS: CsvBounds = { maxLines: 2 * MEASUREMENT_MAX_POINTS, maxRecordSize: 1024 };

export interface RowProblem {
  line: number;
  row: number;
  message: string;
}

/** 422 with the first offending line at the top level and every bad row listed. */
export class CurveFileError extends DomainError {
  constructor(code: string, message: string, line: number | null, rows: RowProblem[] = []) {
    super(code, message, 422, { line, ...(rows.length ? { rows } : {}) });
  }
}

/** S11 of a .s1p, or port 1 of a .s2p, through the RF module's Touchstone reader. */
export function parseTouchstoneS11(bytes: Uint8Array, fileName: string): ParsedCurve {
  const network = withTouchstoneStatus(() => readTouchstone(bytes, { expectedPorts: portsFromFileName(fileName), maxPoints: MEASUREMENT_MAX_POINTS }));
  const curve = reflectionCurveFromNetwork(network, 1);
  return {
    kind: 's11',
    sourceFormat: `Touchstone ${network.version}, ${network.ports}-port, ${network.parameter} ${network.format}`,
    referenceOhms: curve.referenceOhms,
    frequenciesHz: curve.frequenciesHz,
    valuesA: curve.gammaRe,
    valuesB: curve.gammaIm,
    lines: network.pointLines,
  };
}

/**
 * Everything a curve must satisfy to be stored, in one place, so "Check file" and the upload can never
 * disagree: a point count the store takes, finite increasing frequencies, finite values and, for S11,
 * a reflection a passive antenna can have. Each refusal names the file line.
 */
export function checkStorableCurve(curve: ParsedCurve): ParsedCurve {
  const n = curve.frequenciesHz.length;
  if (n < 2) throw new CurveFileError('MEASUREMENT_TOO_FEW_POINTS', `A curve needs at least two points; the file has ${n}`, null);
  if (n > MEASUREMENT_MAX_POINTS)
    throw new CurveFileError(
      'MEASUREMENT_TOO_MANY_POINTS',
      `The file has ${n} points; the limit is ${MEASUREMENT_MAX_POINTS}`,
      curve.lines[MEASUREMENT_MAX_POINTS] ?? null,
    );
  let previousHz = 0;
  for (let i = 0; i < n; i++) {
    const line = curve.lines[i];
    const hz = curve.frequenciesHz[i];
    if (!Number.isFinite(hz) || !(hz > previousHz)) {
      throw new CurveFileError('MEASUREMENT_BAD_FREQUENCY', `line ${line}: the frequency must be a finite number of Hz above the one before`, line);
    }
    previousHz = hz;
    const a = curve.valuesA[i];
    const b = curve.valuesB ? curve.valuesB[i] : 0;
    if (!Number.isFinite(a) || !Number.isFinite(b))
      throw new CurveFileError('MEASUREMENT_VALUE_NOT_FINITE', `line ${line}: the value is not a finite number`, line);
    if (curve.kind === 's11') {
      const magnitude = Math.sqrt(a * a + b * b);
      if (!(magnitude <= PASSIVE_REFLECTION_LIMIT)) {
        throw new CurveFileError(
          'MEASUREMENT_REFLECTION_ABOVE_ONE',
          `line ${line}: |S11| is ${magnitude.toPrecision(4)} at ${hz / 1e6} MHz. A passive antenna reflects at most what it receives (|S11| ≤ 1), so this points to a calibration error; recalibrate and measure again`,
          line,
        );
      }
    }
  }
  return curve;
}

const FREQUENCY_UNIT_IN_HEADER = /(?:^|[^a-z])(ghz|mhz|khz|hz)(?:$|[^a-z])/i;

function frequencyUnitFromHeader(header: string): FrequencyUnit | null {
  const match = FREQUENCY_UNIT_IN_HEADER.exec(header);
  return match ? FREQUENCY_UNITS.find((u) => u.toLowerCase() === match[1].toLowerCase())! : null;
}

function valueUnitFromHeader(header: string): ValueUnit | null {
  if (/%|percent/i.test(header)) return '%';
  if (/(?:^|[^a-z])dbi(?:$|[^a-z])/i.test(header)) return 'dBi';
  if (/(?:^|[^a-z])db(?:$|[^a-z])/i.test(header)) return 'dB';
  if (/ratio|fraction|linear/i.test(header)) return 'ratio';
  return null;
}

const UNITS_FOR_KIND: Record<Exclude<MeasurementKind, 's11'>, ValueUnit[]> = {
  efficiency: ['%', 'dB', 'ratio'],
  'peak-gain': ['dBi'],
  'average-gain': ['dBi'],
};

/** Plausible ranges, so a unit mix-up (a ratio read as %, MHz as GHz) is caught at upload. */
const VALUE_LIMITS: Record<Exclude<MeasurementKind, 's11'>, [number, number, string]> = {
  efficiency: [0, 100, '%'],
  'peak-gain': [-60, 40, 'dBi'],
  'average-gain': [-60, 40, 'dBi'],
};

function pickUnit<T extends string>(fromHeader: T | null, fromForm: T | undefined, column: string, allowed: readonly T[], line: number): T {
  if (fromHeader && fromForm && fromHeader !== fromForm) {
    throw new CurveFileError('CSV_UNIT_CONFLICT', `line ${line}: the ${column} header says ${fromHeader} but the form says ${fromForm}`, line);
  }
  const unit = fromHeader ?? fromForm;
  if (!unit) {
    throw new CurveFileError(
      'CSV_UNIT_MISSING',
      `line ${line}: the ${column} unit is not in the header; name it there (e.g. "${column} (${allowed[0]})") or choose it in the form`,
      line,
    );
  }
  if (!allowed.includes(unit)) {
    throw new CurveFileError('CSV_UNIT_NOT_ALLOWED', `line ${line}: ${unit} is not a ${column} unit here; use ${allowed.join(', ')}`, line);
  }
  return unit;
}

/**
 * Efficiency or gain from CSV: a header row, then frequency and value columns. Units come from the
 * header ("frequency (MHz)", "efficiency (%)") or from the form; every bad row is reported by line.
 */
export function parseCurveCsv(
  bytes: Uint8Array,
  kind: Exclude<MeasurementKind, 's11'>,
  form: { frequencyUnit?: FrequencyUnit; valueUnit?: ValueUnit } = {},
): ParsedCurve {
  const lineTooMany = firstLineBeyond(bytes, CURVE_CSV_BOUNDS.maxLines);
  if (lineTooMany !== null) {
    throw new CurveFileError(
      'CSV_TOO_MANY_LINES',
      `line ${lineTooMany}: the file has more than ${CURVE_CSV_BOUNDS.maxLines} lines; a curve has at most ${MEASUREMENT_MAX_POINTS} points`,
      lineTooMany,
    );
  }
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(Buffer.from(bytes), {
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      comment: '#',
      trim: true,
      bom: true,
      ...csvParseLimits(CURVE_CSV_BOUNDS),
    }) as unknown as typeof records;
  } catch (error) {
    const e = error as { message: string; lines?: number };
    throw new CurveFileError('CSV_MALFORMED', `line ${e.lines ?? 1}: ${e.message}`, e.lines ?? 1);
  }
  if (records.length === 0) throw new CurveFileError('CSV_EMPTY', 'The file has no rows', null);
  const [header, ...data] = records;
  if (header.record.length < 2 || !Number.isNaN(Number(header.record[0]))) {
    throw new CurveFileError(
      'CSV_MISSING_HEADER',
      `line ${header.info.lines}: the first row must name the columns, e.g. "frequency (MHz),${kind === 'efficiency' ? 'efficiency (%)' : 'gain (dBi)'}"`,
      header.info.lines,
    );
  }
  const frequencyUnit = pickUnit(frequencyUnitFromHeader(header.record[0]), form.frequencyUnit, 'frequency', FREQUENCY_UNITS, header.info.lines);
  const valueUnit = pickUnit(valueUnitFromHeader(header.record[1]), form.valueUnit, 'value', UNITS_FOR_KIND[kind], header.info.lines);
  if (data.length < 2) throw new CurveFileError('CSV_TOO_FEW_POINTS', `A curve needs at least two data rows; the file has ${data.length}`, null);
  if (data.length > MEASUREMENT_MAX_POINTS)
    throw new CurveFileError('CSV_TOO_MANY_POINTS', `The file has ${data.length} rows; the limit is ${MEASUREMENT_MAX_POINTS}`, null);

  const multiplier = FREQUENCY_UNIT_HZ[frequencyUnit];
  const [low, high, shown] = VALUE_LIMITS[kind];
  const frequenciesHz = new Float64Array(data.length);
  const values = new Float64Array(data.length);
  const lines = new Int32Array(data.length);
  const problems: RowProblem[] = [];
  let problemCount = 0;
  let previousHz = -Infinity;
  data.forEach(({ record, info }, i) => {
    const report = (message: string) => {
      problemCount++;
      if (problems.length < MAX_REPORTED_ROWS) problems.push({ line: info.lines, row: i + 1, message });
    };
    if (record.length < 2 || record[1] === '') return report('needs a frequency and a value');
    const frequency = Number(record[0]);
    const raw = Number(record[1]);
    if (record[0] === '' || !Number.isFinite(frequency)) return report(`frequency "${record[0].slice(0, 30)}" is not a number`);
    if (!Number.isFinite(raw)) return report(`value "${record[1].slice(0, 30)}" is not a number`);
    const hz = frequency * multiplier;
    if (!(hz > 0)) return report('frequency must be positive');
    if (!Number.isFinite(hz)) return report(`frequency ${frequency} ${frequencyUnit} is beyond any representable number of Hz`);
    if (hz <= previousHz)
      return report(`frequency ${frequency} ${frequencyUnit} does not increase (the row before is ${previousHz / multiplier} ${frequencyUnit})`);
    previousHz = hz;
    const value = valueUnit === 'dB' ? efficiencyDbToPercent(raw) : valueUnit === 'ratio' ? raw * 100 : raw;
    if (value < low || value > high) return report(`value ${raw} ${valueUnit} is outside ${low}…${high} ${shown}`);
    frequenciesHz[i] = hz;
    values[i] = value;
    lines[i] = info.lines;
  });
  if (problemCount > 0) {
    const first = problems[0];
    throw new CurveFileError(
      'CSV_BAD_ROWS',
      `${problemCount} row${problemCount === 1 ? ' is' : 's are'} invalid; first at line ${first.line}: ${first.message}`,
      first.line,
      problems,
    );
  }
  return { kind, sourceFormat: `CSV, ${frequencyUnit}, ${valueUnit}`, referenceOhms: null, frequenciesHz, valuesA: values, valuesB: null, lines };
}
