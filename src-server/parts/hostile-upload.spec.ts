import { withTouchstoneStatus } from '../common/touchstone-http-error';
import { readTouchstone } from '../rf/touchstone';
import { sniffDocumentType } from './documents/document-type';
import { checkStorableCurve, parseCurveCsv, parseTouchstoneS11 } from './measurements/measurement-parsers';
import { parsePartCsv } from './import-export/part-csv';

/**
 * Every parser of uploaded input gets a hostile input and a budget of time and of memory, measured
 * around the call. The time budgets are about ten times what a busy 2-core machine takes, yet far below
 * what the unbounded parsers took (the SVG regex: seconds at 36 comments, doubling with each; the CSV
 * parsers: millions of records and hundreds of MiB; 2,000-band import rows: over a second each).
 */
interface Budget {
  ms: number;
  mib: number;
}

interface Outcome {
  ms: number;
  mib: number;
  result: unknown;
  error: { code?: string; status?: number; details?: { line?: number | null } } | null;
}

function measure(call: () => unknown): Outcome {
  // Heap and buffers after the call, garbage included: an upper bound of what the call allocated and kept.
  const before = process.memoryUsage();
  let peak = before.heapUsed + before.arrayBuffers;
  const started = process.hrtime.bigint();
  let result: unknown = null;
  let error: Outcome['error'] = null;
  try {
    result = call();
  } catch (caught) {
    error = caught as Outcome['error'];
  }
  const ms = Number(process.hrtime.bigint() - started) / 1e6;
  const after = process.memoryUsage();
  peak = Math.max(peak, after.heapUsed + after.arrayBuffers);
  return { ms, mib: (peak - (before.heapUsed + before.arrayBuffers)) / 1048576, result, error };
}

function expectWithin(outcome: Outcome, budget: Budget): void {
  if (process.env.SHOW_BUDGETS) console.log(JSON.stringify({ ms: Math.round(outcome.ms), mib: Math.round(outcome.mib), code: outcome.error?.code }));
  expect({ ms: outcome.ms <= budget.ms, mib: outcome.mib <= budget.mib }).toEqual({ ms: true, mib: true });
}

const MIB = 1024 * 1024;

describe('hostile uploads: each parser stays within a time and memory budget', () => {
  it('SVG sniffing: 250 bytes of empty comments (exponential for the old regex)', () => {
    const hostile = Buffer.from('<!---->'.repeat(36));
    const outcome = measure(() => sniffDocumentType(hostile));
    expect(outcome.result).toBeNull();
    expectWithin(outcome, { ms: 1000, mib: 5 });
    const longer = measure(() => sniffDocumentType(Buffer.from(`${'<!---->'.repeat(140)}<svg>`)));
    expectWithin(longer, { ms: 1000, mib: 5 });
  });

  it('measurement CSV: 16 MiB of short rows is refused with a line, before csv-parse builds millions of records', () => {
    const hostile = Buffer.from(`frequency (MHz),efficiency (%)\n${'1,1\n'.repeat((16 * MIB) / 4 - 10)}`);
    const outcome = measure(() => parseCurveCsv(hostile, 'efficiency'));
    expect(outcome.error).toMatchObject({ code: 'CSV_TOO_MANY_LINES', status: 422 });
    expect(outcome.error?.details?.line).toBeGreaterThan(100_000);
    expectWithin(outcome, { ms: 5000, mib: 64 });
  });

  it('measurement CSV: one endless record is refused by the record size limit', () => {
    const hostile = Buffer.from(`frequency (MHz),efficiency (%)\n1,${'9'.repeat(8 * MIB)}\n`);
    const outcome = measure(() => parseCurveCsv(hostile, 'efficiency'));
    expect(outcome.error).toMatchObject({ code: 'CSV_MALFORMED', status: 422 });
    expectWithin(outcome, { ms: 5000, mib: 64 });
  });

  it('part import CSV: 4 MiB of short rows is refused before parsing', () => {
    const hostile = Buffer.from(`manufacturer,mpn,title,formFactor,connector,polarization\n${'a,b,c,d,e,f\n'.repeat((4 * MIB) / 12 - 10)}`);
    const outcome = measure(() => parsePartCsv(hostile));
    expect(outcome.error).toMatchObject({ code: 'PART_IMPORT_TOO_MANY_ROWS', status: 422 });
    expectWithin(outcome, { ms: 5000, mib: 64 });
  });

  it('part import CSV: rows of 2,000 spec bands each are refused without validating every band', () => {
    const bands = Array.from({ length: 2000 }, (_, i) => `${i + 1}-${i + 2}`).join('; ');
    const rows = Array.from({ length: 100 }, (_, i) => `Acme,M${i},T,chip,SMA,linear,"${bands}"\n`).join('');
    const file = Buffer.from(`manufacturer,mpn,title,formFactor,connector,polarization,specBands\n${rows}`);
    const outcome = measure(() => parsePartCsv(file));
    expect((outcome.result as ReturnType<typeof parsePartCsv>).problems).toHaveLength(100);
    expectWithin(outcome, { ms: 5000, mib: 64 });
  });

  it('Touchstone (stored measurement): 16 MiB of short points stops at the 100,000-point limit with its line', () => {
    const hostile = Buffer.from(`# Hz S RI R 50\n${Array.from({ length: (16 * MIB) / 16 }, (_, i) => `${i + 1} 0.1 0\n`).join('')}`.slice(0, 16 * MIB));
    const outcome = measure(() => checkStorableCurve(parseTouchstoneS11(hostile, 'sweep.s1p')));
    expect(outcome.error).toMatchObject({ code: 'TOUCHSTONE_TOO_MANY_POINTS', status: 422, details: { line: 100_002 } });
    expectWithin(outcome, { ms: 5000, mib: 64 });
  });

  it('Touchstone (Tools): one 32 MiB line is refused by the line length limit', () => {
    const hostile = Buffer.alloc(32 * MIB - 1024, 0x31);
    const outcome = measure(() => withTouchstoneStatus(() => readTouchstone(hostile)));
    expect(outcome.error).toMatchObject({ status: 422, details: { line: 1 } });
    expectWithin(outcome, { ms: 5000, mib: 16 });
    const longOptionLine = Buffer.from(`# ${'MHz '.repeat((8 * MIB) / 4)}\n1 0 0\n`);
    const option = measure(() => withTouchstoneStatus(() => readTouchstone(longOptionLine)));
    expect(option.error).toMatchObject({ code: 'TOUCHSTONE_LINE_TOO_LONG', status: 422, details: { line: 1 } });
    expectWithin(option, { ms: 5000, mib: 16 });
  });

  it('Touchstone: non-finite numbers and |S11| above 1 are refused with their line, quickly', () => {
    const infinite = measure(() => parseTouchstoneS11(Buffer.from('# MHz S RI R 50\n800 0.1 0\n900 1e309 0\n'), 'a.s1p'));
    expect(infinite.error).toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', details: { line: 3 } });
    const active = measure(() => checkStorableCurve(parseTouchstoneS11(Buffer.from('# MHz S MA R 50\n800 0.5 0\n850 0.9 10\n900 1.2 0\n'), 'a.s1p')));
    expect(active.error).toMatchObject({ code: 'MEASUREMENT_REFLECTION_ABOVE_ONE', status: 422, details: { line: 4 } });
    expectWithin(infinite, { ms: 1000, mib: 5 });
    expectWithin(active, { ms: 1000, mib: 5 });
  });
});
