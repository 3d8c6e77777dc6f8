import { writeCsv } from '../common/csv-writer';
import type { CoexistenceFinding } from './engine/coexistence-check';
import { MATRIX_CSV_CAUTION, matrixCsvFileName } from './matrix-csv';

export const COEXISTENCE_CSV_CAUTION = `${MATRIX_CSV_CAUTION} Required isolation rests on assumed emission levels and receiver figures (the coexistence rule's parameters); confirm with conducted and radiated measurements.`;

export const COEXISTENCE_CSV_HEADER = [
  'Product',
  'Aggressor radio',
  'Aggressor band',
  'Second aggressor (radio, band)',
  'Mechanism',
  'Order',
  'Product formed as',
  'Product from (MHz)',
  'Product to (MHz)',
  'Victim radio',
  'Victim band',
  'Victim receive from (MHz)',
  'Victim receive to (MHz)',
  'Overlap (MHz)',
  'Distance outside the receive range (MHz)',
  'Severity',
  'Aggressor power (dBm)',
  'Assumed emission level (dBc)',
  'Victim tolerable interference (dBm)',
  'Required isolation (dB)',
  'In-product isolation (dB)',
  'Isolation margin (dB)',
  'Finding',
] as const;

const SEVERITY_WORDS: Record<string, string> = { fail: 'fail', marginal: 'marginal', info: 'note' };
const blankIfNull = (value: number | null) => (value === null ? 'unknown' : value);

/** One line per coexistence finding, in words and units; the caution comes first. */
export function coexistenceToCsv(productName: string, radioNames: ReadonlyMap<number, string>, findings: readonly CoexistenceFinding[]): string {
  const radio = (id: number) => radioNames.get(id) ?? `radio ${id}`;
  const rows = findings.map((f) => [
    productName,
    radio(f.aggressor.radioId),
    f.aggressor.designation,
    f.secondAggressor ? `${radio(f.secondAggressor.radioId)}, ${f.secondAggressor.designation}` : '',
    f.mechanism,
    f.order,
    f.expression,
    f.fromMhz,
    f.toMhz,
    radio(f.victim.radioId),
    f.victim.designation,
    f.victimFromMhz,
    f.victimToMhz,
    f.overlapMhz,
    f.distanceMhz,
    SEVERITY_WORDS[f.severity] ?? f.severity,
    f.aggressorPowerDbm,
    f.emissionDbc,
    f.victimTolerableDbm,
    f.requiredIsolationDb,
    blankIfNull(f.isolationDb),
    blankIfNull(f.isolationMarginDb),
    f.message,
  ]);
  return writeCsv(COEXISTENCE_CSV_HEADER, rows, [[`# ${COEXISTENCE_CSV_CAUTION}`]]);
}

export function coexistenceCsvFileName(productName: string): string {
  return `coexistence-${matrixCsvFileName(productName).slice('matrix-'.length)}`;
}
