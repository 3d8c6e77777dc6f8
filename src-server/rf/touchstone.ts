import { DomainError } from '../common/domain-error';
import { type Complex, add, complex, div, mul, sub } from './complex';

/**
 * Touchstone reader for versions 1.x and 2.x, 1- and 2-port (IBIS Touchstone File Format Specification
 * Rev 1.1 (2002), Version 2.0 (2009), Version 2.1 (2024)). Data of any parameter (S, Y, Z, H, G) are
 * returned as S-parameters against the file's reference resistances.
 *
 * The scanner works on bytes and parses numbers by hand: regexes and String.split per token cost
 * several times more on 100,000-point files (measured in src-server/bench/rf-bench.ts).
 */

/** Largest file accepted: 32 MiB, above the 20 MB the API promises and about 250,000 2-port points. */
export const TOUCHSTONE_MAX_BYTES = 32 * 1024 * 1024;
/** Most points read by default: more than any instrument sweep (they stop near 100,001), and bounded memory. */
export const TOUCHSTONE_MAX_POINTS = 250_000;
/** Longest line: a 2-port data line is under 200 bytes; a longer line is not Touchstone. */
export const TOUCHSTONE_MAX_LINE_BYTES = 8192;

export type TouchstoneErrorCode =
  | 'TOUCHSTONE_EMPTY'
  | 'TOUCHSTONE_TOO_LARGE'
  | 'TOUCHSTONE_MISSING_OPTION_LINE'
  | 'TOUCHSTONE_BAD_OPTION_LINE'
  | 'TOUCHSTONE_UNKNOWN_UNIT'
  | 'TOUCHSTONE_BAD_NUMBER'
  | 'TOUCHSTONE_DATA_LINE_LENGTH'
  | 'TOUCHSTONE_FREQUENCY_NOT_INCREASING'
  | 'TOUCHSTONE_MISSING_END'
  | 'TOUCHSTONE_FREQUENCY_COUNT_MISMATCH'
  | 'TOUCHSTONE_NOISE_COUNT_MISMATCH'
  | 'TOUCHSTONE_WRONG_PORT_COUNT'
  | 'TOUCHSTONE_NO_SUCH_PORT'
  | 'TOUCHSTONE_UNSUPPORTED_VERSION'
  | 'TOUCHSTONE_MISSING_KEYWORD'
  | 'TOUCHSTONE_BAD_KEYWORD'
  | 'TOUCHSTONE_UNKNOWN_KEYWORD'
  | 'TOUCHSTONE_LINE_TOO_LONG'
  | 'TOUCHSTONE_TOO_MANY_POINTS';

/** A file the reader refuses; `line` is 1-based, or null when the problem is the file as a whole. */
export class TouchstoneError extends DomainError {
  readonly line: number | null;
  readonly touchstoneCode: TouchstoneErrorCode;

  constructor(code: TouchstoneErrorCode, line: number | null, detail: string) {
    super(code, line === null ? detail : `line ${line}: ${detail}`, code === 'TOUCHSTONE_TOO_LARGE' ? 413 : 422, { line });
    this.name = 'TouchstoneError';
    this.line = line;
    this.touchstoneCode = code;
  }
}

export type FrequencyUnit = 'Hz' | 'kHz' | 'MHz' | 'GHz';
export type NetworkParameter = 'S' | 'Y' | 'Z' | 'H' | 'G';
export type DataFormat = 'DB' | 'MA' | 'RI';
/** `21_12` is the version-1 order N11 N21 N12 N22; `12_21` is row-major N11 N12 N21 N22 (rf-reference §0 trap 2). */
export type TwoPortDataOrder = '12_21' | '21_12';
export type MatrixFormat = 'Full' | 'Lower' | 'Upper';

export const FREQUENCY_UNIT_HZ: Readonly<Record<FrequencyUnit, number>> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

export interface ComplexSeries {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export interface TouchstoneNetwork {
  /** '1.0', '1.1' (v1 syntax with one R per port), '2.0' or '2.1'. */
  readonly version: string;
  readonly ports: 1 | 2;
  /** The parameter the file was written in; `s` below is always S. */
  readonly parameter: NetworkParameter;
  readonly format: DataFormat;
  readonly frequencyUnit: FrequencyUnit;
  /** One reference resistance per port, in ohms. */
  readonly referenceOhms: readonly number[];
  readonly twoPortDataOrder: TwoPortDataOrder | null;
  readonly matrixFormat: MatrixFormat;
  readonly frequenciesHz: Float64Array;
  /** S-parameters row-major: index (row − 1) × ports + (column − 1). */
  readonly s: readonly ComplexSeries[];
  /** Noise-parameter points recognised and skipped. */
  readonly noisePointCount: number;
  /** The 1-based file line each point starts on, so a later check can name it. */
  readonly pointLines: Int32Array;
}

export interface TouchstoneReadOptions {
  /** Port count implied by the file name (.s1p → 1); a file that disagrees is refused. */
  readonly expectedPorts?: number;
  readonly maxBytes?: number;
  /** Most network points accepted (default TOUCHSTONE_MAX_POINTS); the point past it is refused with its line. */
  readonly maxPoints?: number;
  /** Longest line accepted (default TOUCHSTONE_MAX_LINE_BYTES). */
  readonly maxLineBytes?: number;
}

/** Ports implied by a Touchstone file name: `.s2p` → 2; `.ts` (version 2) and others → undefined. */
export function portsFromFileName(fileName: string): number | undefined {
  const match = /\.s(\d+)p$/i.exec(fileName);
  return match ? Number(match[1]) : undefined;
}

export function sParameter(network: TouchstoneNetwork, row: number, column: number): ComplexSeries {
  if (row < 1 || column < 1 || row > network.ports || column > network.ports) {
    throw new TouchstoneError('TOUCHSTONE_NO_SUCH_PORT', null, `S${row}${column} does not exist in a ${network.ports}-port file`);
  }
  return network.s[(row - 1) * network.ports + (column - 1)];
}

// ---------------------------------------------------------------------------------------------
// Byte scanning

const CHAR_TAB = 9;
const CHAR_LF = 10;
const CHAR_VT = 11;
const CHAR_FF = 12;
const CHAR_CR = 13;
const CHAR_SPACE = 32;
const CHAR_BANG = 33;
const CHAR_HASH = 35;
const CHAR_PLUS = 43;
const CHAR_COMMA = 44;
const CHAR_MINUS = 45;
const CHAR_DOT = 46;
const CHAR_0 = 48;
const CHAR_9 = 57;
const CHAR_E_UPPER = 69;
const CHAR_BRACKET = 91;
const CHAR_E_LOWER = 101;

const POWERS_OF_TEN = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
const MAX_EXACT_MANTISSA = 2 ** 53;
const DEG_TO_RAD = Math.PI / 180;
/** More digits than this add nothing to a double (17 significant digits) and only cost time. */
const MAX_NUMBER_CHARACTERS = 64;

function latin1(bytes: Uint8Array, start: number, end: number): string {
  let text = '';
  for (let i = start; i < end; i++) text += String.fromCharCode(bytes[i]);
  return text;
}

/** Numbers of one data line, parsed into a reusable buffer; `count` may exceed the buffer (then only counted). */
class LineNumbers {
  readonly values: Float64Array;
  count = 0;

  constructor(capacity: number) {
    this.values = new Float64Array(capacity);
  }
}

/** Blanks between numbers: space, tab, VT, FF and (leniently) comma. */
function isBlank(c: number): boolean {
  return c === CHAR_SPACE || c === CHAR_TAB || c === CHAR_VT || c === CHAR_FF || c === CHAR_COMMA;
}

/** What may follow a number: a blank, the end of the line, or a comment. */
function endsToken(c: number): boolean {
  return isBlank(c) || c === CHAR_LF || c === CHAR_CR || c === CHAR_BANG;
}

/**
 * Parses the numbers from `start` to the end of the line or a comment into `out` and returns where it
 * stopped. A decimal with a mantissa below 2^53 and |exponent| ≤ 22 is exact in one rounding;
 * anything longer goes to Number().
 */
function scanNumbers(bytes: Uint8Array, start: number, out: LineNumbers, lineNumber: number): number {
  const values = out.values;
  const capacity = values.length;
  const end = bytes.length;
  let count = 0;
  let i = start;
  while (i < end) {
    let c = bytes[i];
    if (c === CHAR_SPACE || c === CHAR_TAB) {
      i++;
      continue;
    }
    if (c === CHAR_LF || c === CHAR_CR || c === CHAR_BANG) break;
    if (isBlank(c)) {
      i++;
      continue;
    }
    const tokenStart = i;
    let negative = false;
    if (c === CHAR_MINUS || c === CHAR_PLUS) {
      negative = c === CHAR_MINUS;
      i++;
    }
    let mantissa = 0;
    let digits = 0;
    let exponent = 0;
    while (i < end && (c = bytes[i]) >= CHAR_0 && c <= CHAR_9) {
      mantissa = mantissa * 10 + (c - CHAR_0);
      digits++;
      i++;
    }
    if (i < end && bytes[i] === CHAR_DOT) {
      i++;
      while (i < end && (c = bytes[i]) >= CHAR_0 && c <= CHAR_9) {
        mantissa = mantissa * 10 + (c - CHAR_0);
        digits++;
        exponent--;
        i++;
      }
    }
    let valid = digits > 0;
    if (valid && i < end && ((c = bytes[i]) === CHAR_E_LOWER || c === CHAR_E_UPPER)) {
      i++;
      let exponentNegative = false;
      if (i < end && ((c = bytes[i]) === CHAR_MINUS || c === CHAR_PLUS)) {
        exponentNegative = c === CHAR_MINUS;
        i++;
      }
      let exponentValue = 0;
      let exponentDigits = 0;
      while (i < end && (c = bytes[i]) >= CHAR_0 && c <= CHAR_9) {
        if (exponentValue < 100_000) exponentValue = exponentValue * 10 + (c - CHAR_0);
        exponentDigits++;
        i++;
      }
      valid = exponentDigits > 0;
      exponent += exponentNegative ? -exponentValue : exponentValue;
    }
    if (!valid || (i < end && !endsToken(bytes[i]))) {
      // Only as much of the token as the message shows is read, however long the token is.
      let tokenEnd = i;
      while (tokenEnd < end && tokenEnd - tokenStart <= 40 && !endsToken(bytes[tokenEnd])) tokenEnd++;
      const token = latin1(bytes, tokenStart, tokenEnd);
      throw new TouchstoneError('TOUCHSTONE_BAD_NUMBER', lineNumber, `'${token.length > 40 ? token.slice(0, 40) + '…' : token}' is not a number`);
    }
    let value: number;
    if (mantissa < MAX_EXACT_MANTISSA && exponent >= -22 && exponent <= 22) {
      value = exponent >= 0 ? mantissa * POWERS_OF_TEN[exponent] : mantissa / POWERS_OF_TEN[-exponent];
      if (negative) value = -value;
    } else {
      if (i - tokenStart > MAX_NUMBER_CHARACTERS) {
        throw new TouchstoneError('TOUCHSTONE_BAD_NUMBER', lineNumber, `a number of ${i - tokenStart} characters is too long (at most ${MAX_NUMBER_CHARACTERS})`);
      }
      value = Number(latin1(bytes, tokenStart, i));
    }
    if (!Number.isFinite(value)) {
      throw new TouchstoneError('TOUCHSTONE_BAD_NUMBER', lineNumber, `'${latin1(bytes, tokenStart, Math.min(i, tokenStart + 40))}' is out of range`);
    }
    if (count < capacity) values[count] = value;
    count++;
  }
  out.count = count;
  return i;
}

// ---------------------------------------------------------------------------------------------
// Option line and keywords

interface OptionLine {
  readonly frequencyUnit: FrequencyUnit;
  readonly parameter: NetworkParameter;
  readonly format: DataFormat;
  readonly referenceOhms: readonly number[];
  readonly lineNumber: number;
}

const UNIT_BY_TOKEN: Readonly<Record<string, FrequencyUnit>> = { HZ: 'Hz', KHZ: 'kHz', MHZ: 'MHz', GHZ: 'GHz' };
const PARAMETERS: readonly NetworkParameter[] = ['S', 'Y', 'Z', 'H', 'G'];
const FORMATS: readonly DataFormat[] = ['DB', 'MA', 'RI'];

function parseOptionLine(text: string, lineNumber: number): OptionLine {
  const tokens = text.slice(1).trim().split(/\s+/).filter((t) => t.length > 0);
  let frequencyUnit: FrequencyUnit | undefined;
  let parameter: NetworkParameter | undefined;
  let format: DataFormat | undefined;
  let referenceOhms: number[] | undefined;
  const bad = (detail: string): never => {
    throw new TouchstoneError('TOUCHSTONE_BAD_OPTION_LINE', lineNumber, detail);
  };
  for (let k = 0; k < tokens.length; k++) {
    const token = tokens[k].toUpperCase();
    if (token in UNIT_BY_TOKEN) {
      if (frequencyUnit) bad(`the option line gives the frequency unit twice`);
      frequencyUnit = UNIT_BY_TOKEN[token];
    } else if ((PARAMETERS as readonly string[]).includes(token)) {
      if (parameter) bad(`the option line gives the parameter twice`);
      parameter = token as NetworkParameter;
    } else if ((FORMATS as readonly string[]).includes(token)) {
      if (format) bad(`the option line gives the format twice`);
      format = token as DataFormat;
    } else if (token === 'R') {
      if (referenceOhms) bad(`the option line gives R twice`);
      referenceOhms = [];
      while (k + 1 < tokens.length && /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(tokens[k + 1])) {
        const ohms = Number(tokens[++k]);
        if (!(ohms > 0)) bad(`reference resistance ${tokens[k]} must be positive`);
        referenceOhms.push(ohms);
      }
      if (referenceOhms.length === 0) bad(`R must be followed by the reference resistance in ohms`);
    } else if (/^[A-Z]*HZ$/.test(token)) {
      throw new TouchstoneError('TOUCHSTONE_UNKNOWN_UNIT', lineNumber, `unknown frequency unit '${tokens[k]}' (expected Hz, kHz, MHz or GHz)`);
    } else {
      bad(`unexpected '${tokens[k]}' on the option line (expected a unit Hz/kHz/MHz/GHz, a parameter S/Y/Z/H/G, a format DB/MA/RI, or R <ohms>)`);
    }
  }
  // Defaults when omitted: # GHz S MA R 50 (Touchstone 1.1, Option Line).
  return {
    frequencyUnit: frequencyUnit ?? 'GHz',
    parameter: parameter ?? 'S',
    format: format ?? 'MA',
    referenceOhms: referenceOhms ?? [50],
    lineNumber,
  };
}

/** Splits `[Keyword Name] rest` into a normalised lower-case name and the rest; null if unterminated. */
function splitKeyword(text: string): { name: string; argument: string } | null {
  const close = text.indexOf(']');
  if (close < 0) return null;
  return { name: text.slice(1, close).trim().toLowerCase().replace(/\s+/g, ' '), argument: text.slice(close + 1).trim() };
}

function positiveInteger(argument: string, keyword: string, lineNumber: number): number {
  const value = /^\d+$/.test(argument) ? Number(argument) : NaN;
  if (!(value >= 1)) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `${keyword} needs a positive whole number, found '${argument}'`);
  return value;
}

// ---------------------------------------------------------------------------------------------
// Data storage and conversion to S

/** Where each complex pair of a data point goes in the row-major matrix; mirrored pairs fill symmetric cells. */
function pairLayout(ports: 1 | 2, order: TwoPortDataOrder, matrixFormat: MatrixFormat): { targets: number[]; mirrors: [number, number][] } {
  if (ports === 1) return { targets: [0], mirrors: [] };
  if (matrixFormat === 'Lower') return { targets: [0, 2, 3], mirrors: [[2, 1]] };
  if (matrixFormat === 'Upper') return { targets: [0, 1, 3], mirrors: [[1, 2]] };
  return { targets: order === '21_12' ? [0, 2, 1, 3] : [0, 1, 2, 3], mirrors: [] };
}

class PointStore {
  capacity: number;
  length = 0;
  frequenciesHz: Float64Array;
  lines: Int32Array;
  re: Float64Array[];
  im: Float64Array[];

  constructor(readonly elements: number, initialCapacity: number) {
    this.capacity = Math.max(16, initialCapacity);
    this.frequenciesHz = new Float64Array(this.capacity);
    this.lines = new Int32Array(this.capacity);
    this.re = Array.from({ length: elements }, () => new Float64Array(this.capacity));
    this.im = Array.from({ length: elements }, () => new Float64Array(this.capacity));
  }

  grow(): void {
    const capacity = this.capacity * 2;
    const copy = (a: Float64Array): Float64Array => {
      const b = new Float64Array(capacity);
      b.set(a);
      return b;
    };
    this.frequenciesHz = copy(this.frequenciesHz);
    const lines = new Int32Array(capacity);
    lines.set(this.lines);
    this.lines = lines;
    this.re = this.re.map(copy);
    this.im = this.im.map(copy);
    this.capacity = capacity;
  }

  series(): ComplexSeries[] {
    return this.re.map((re, k) => ({ re: re.slice(0, this.length), im: this.im[k].slice(0, this.length) }));
  }
}

const ONE = complex(1);

/** 2×2 complex matrix, row-major [a11, a12, a21, a22]. */
type Matrix2 = [Complex, Complex, Complex, Complex];

function inverse2(m: Matrix2): Matrix2 {
  const det = sub(mul(m[0], m[3]), mul(m[1], m[2]));
  return [div(m[3], det), div(scaleNeg(m[1]), det), div(scaleNeg(m[2]), det), div(m[0], det)];
}

function scaleNeg(a: Complex): Complex {
  return { re: -a.re, im: -a.im };
}

function multiply2(a: Matrix2, b: Matrix2): Matrix2 {
  return [
    add(mul(a[0], b[0]), mul(a[1], b[2])),
    add(mul(a[0], b[1]), mul(a[1], b[3])),
    add(mul(a[2], b[0]), mul(a[3], b[2])),
    add(mul(a[2], b[1]), mul(a[3], b[3])),
  ];
}

/**
 * Converts one point of normalised Z, Y, H or G data to S (Pozar, Microwave Engineering 4th ed.,
 * §4.3 and Table 4.2): S = (z − I)(z + I)⁻¹, S = (I − y)(I + y)⁻¹; H and G through the hybrid formulas.
 */
function normalisedToS(parameter: NetworkParameter, ports: 1 | 2, n: Complex[]): Complex[] {
  if (ports === 1) {
    if (parameter === 'Z') return [div(sub(n[0], ONE), add(n[0], ONE))];
    return [div(sub(ONE, n[0]), add(ONE, n[0]))];
  }
  const m: Matrix2 = [n[0], n[1], n[2], n[3]];
  const identity: Matrix2 = [ONE, complex(0), complex(0), ONE];
  if (parameter === 'Z') {
    return multiply2(m.map((v, k) => sub(v, identity[k])) as Matrix2, inverse2(m.map((v, k) => add(v, identity[k])) as Matrix2));
  }
  if (parameter === 'Y') {
    return multiply2(m.map((v, k) => sub(identity[k], v)) as Matrix2, inverse2(m.map((v, k) => add(identity[k], v)) as Matrix2));
  }
  const h = parameter === 'H' ? m : inverse2(m);
  const [h11, h12, h21, h22] = h;
  const h12h21 = mul(h12, h21);
  const delta = sub(mul(add(h11, ONE), add(h22, ONE)), h12h21);
  return [
    div(sub(mul(sub(h11, ONE), add(h22, ONE)), h12h21), delta),
    div(scaleBy(h12, 2), delta),
    div(scaleBy(h21, -2), delta),
    div(add(mul(add(ONE, h11), sub(ONE, h22)), h12h21), delta),
  ];
}

function scaleBy(a: Complex, factor: number): Complex {
  return { re: a.re * factor, im: a.im * factor };
}

/**
 * Factors that normalise each row-major element. v1 data are already normalised to R; v2 Z and Y are in
 * ohms and siemens (Touchstone 2.0, Option Line), H and G mix both (h11 Ω, h22 S, h12/h21 unitless).
 */
function normalisationFactors(parameter: NetworkParameter, ports: 1 | 2, referenceOhms: readonly number[], version1: boolean): number[] {
  const count = ports * ports;
  if (version1 || parameter === 'S') return new Array<number>(count).fill(1);
  const r = (port: number) => referenceOhms[port];
  if (ports === 1) return [parameter === 'Z' ? 1 / r(0) : r(0)];
  if (parameter === 'Z') return [1 / r(0), 1 / Math.sqrt(r(0) * r(1)), 1 / Math.sqrt(r(0) * r(1)), 1 / r(1)];
  if (parameter === 'Y') return [r(0), Math.sqrt(r(0) * r(1)), Math.sqrt(r(0) * r(1)), r(1)];
  if (parameter === 'H') return [1 / r(0), Math.sqrt(r(1) / r(0)), Math.sqrt(r(1) / r(0)), r(1)];
  return [r(0), Math.sqrt(r(0) / r(1)), Math.sqrt(r(0) / r(1)), 1 / r(1)];
}

// ---------------------------------------------------------------------------------------------
// Reader

interface ReaderState {
  version: string;
  isVersion2: boolean;
  option: OptionLine | null;
  ports: 1 | 2 | null;
  portsLine: number;
  twoPortDataOrder: TwoPortDataOrder | null;
  matrixFormat: MatrixFormat;
  frequencyCount: number | null;
  frequencyCountLine: number;
  noiseFrequencyCount: number | null;
  referenceOhms: number[] | null;
  referencePending: number;
  referenceLine: number;
  section: 'header' | 'network' | 'noise' | 'information' | 'ended';
  noisePointCount: number;
  lastNoiseFrequencyHz: number;
}

export function readTouchstone(input: string | Uint8Array, options: TouchstoneReadOptions = {}): TouchstoneNetwork {
  const maxBytes = options.maxBytes ?? TOUCHSTONE_MAX_BYTES;
  const maxPoints = options.maxPoints ?? TOUCHSTONE_MAX_POINTS;
  const maxLineBytes = options.maxLineBytes ?? TOUCHSTONE_MAX_LINE_BYTES;
  const tooLarge = (size: number) =>
    new TouchstoneError('TOUCHSTONE_TOO_LARGE', null, `the file is ${size} bytes; the limit is ${maxBytes} bytes (${(maxBytes / 1048576).toFixed(0)} MiB)`);
  if (typeof input === 'string' && input.length > maxBytes) throw tooLarge(input.length);
  const bytes = typeof input === 'string' ? new TextEncoder().encode(input) : input;
  if (bytes.length > maxBytes) throw tooLarge(bytes.length);

  const state: ReaderState = {
    version: '1.0',
    isVersion2: false,
    option: null,
    ports: null,
    portsLine: 0,
    twoPortDataOrder: null,
    matrixFormat: 'Full',
    frequencyCount: null,
    frequencyCountLine: 0,
    noiseFrequencyCount: null,
    referenceOhms: null,
    referencePending: 0,
    referenceLine: 0,
    section: 'header',
    noisePointCount: 0,
    lastNoiseFrequencyHz: -Infinity,
  };

  const numbers = new LineNumbers(16);
  let store: PointStore | null = null;
  let layout: ReturnType<typeof pairLayout> | null = null;
  let frequencyMultiplier = 1;
  let format: DataFormat = 'MA';
  let parameter: NetworkParameter = 'S';
  let normalisation: number[] = [];
  let valuesPerPoint = 0;
  let lastFrequencyHz = -Infinity;
  let sawContent = false;
  // A version-2 point may wrap over several lines; these hold the partial point.
  const pending = new Float64Array(1 + 2 * 4);
  let pendingCount = 0;
  let pendingLine = 0;

  const startNetworkData = (lineNumber: number, ports: 1 | 2) => {
    const option = state.option;
    if (!option) throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `data before the option line (# <unit> <parameter> <format> R <ohms>)`);
    if ((option.parameter === 'H' || option.parameter === 'G') && ports !== 2) {
      throw new TouchstoneError('TOUCHSTONE_BAD_OPTION_LINE', option.lineNumber, `${option.parameter} parameters describe 2-port networks; this file has ${ports} port`);
    }
    const references = state.referenceOhms ?? option.referenceOhms;
    if (references.length !== 1 && references.length !== ports) {
      throw new TouchstoneError('TOUCHSTONE_BAD_OPTION_LINE', state.referenceOhms ? state.referenceLine : option.lineNumber, `${references.length} reference resistances for a ${ports}-port file`);
    }
    state.referenceOhms = references.length === ports ? [...references] : new Array<number>(ports).fill(references[0]);
    if (!state.isVersion2 && option.referenceOhms.length > 1) state.version = '1.1';
    state.ports = ports;
    frequencyMultiplier = FREQUENCY_UNIT_HZ[option.frequencyUnit];
    format = option.format;
    parameter = option.parameter;
    normalisation = normalisationFactors(parameter, ports, state.referenceOhms, !state.isVersion2);
    layout = pairLayout(ports, state.twoPortDataOrder ?? '21_12', state.matrixFormat);
    valuesPerPoint = 1 + 2 * layout.targets.length;
    // Sized from the file (about 24 bytes a 1-port point), never beyond the point limit.
    store = new PointStore(ports * ports, Math.min(maxPoints, Math.ceil(bytes.length / (ports === 1 ? 24 : 72))));
  };

  const checkPorts = (ports: number, lineNumber: number, how: string) => {
    if (options.expectedPorts !== undefined && options.expectedPorts !== ports) {
      throw new TouchstoneError('TOUCHSTONE_WRONG_PORT_COUNT', lineNumber, `the file name says ${options.expectedPorts} port${options.expectedPorts === 1 ? '' : 's'} but ${how} ${ports}`);
    }
    if (ports !== 1 && ports !== 2) {
      throw new TouchstoneError('TOUCHSTONE_WRONG_PORT_COUNT', lineNumber, `only 1- and 2-port files are supported, ${how} ${ports}`);
    }
  };

  const addPoint = (values: Float64Array, lineNumber: number) => {
    const s = store!;
    const frequencyHz = values[0] * frequencyMultiplier;
    if (!(frequencyHz > lastFrequencyHz) || frequencyHz < 0) {
      throw new TouchstoneError(
        'TOUCHSTONE_FREQUENCY_NOT_INCREASING',
        lineNumber,
        frequencyHz < 0 ? `frequency ${values[0]} is negative` : `frequency ${values[0]} does not increase (the previous point was ${lastFrequencyHz / frequencyMultiplier})`,
      );
    }
    if (!Number.isFinite(frequencyHz)) {
      throw new TouchstoneError('TOUCHSTONE_BAD_NUMBER', lineNumber, `frequency ${values[0]} ${state.option!.frequencyUnit} is beyond any representable number of Hz`);
    }
    if (s.length >= maxPoints) {
      throw new TouchstoneError('TOUCHSTONE_TOO_MANY_POINTS', lineNumber, `the file has more than ${maxPoints} points; the limit is ${maxPoints}`);
    }
    lastFrequencyHz = frequencyHz;
    if (s.length === s.capacity) s.grow();
    const index = s.length++;
    s.frequenciesHz[index] = frequencyHz;
    s.lines[index] = lineNumber;
    const targets = layout!.targets;
    const direct = parameter === 'S';
    const converted: Complex[] | null = direct ? null : new Array<Complex>(s.elements);
    for (let k = 0; k < targets.length; k++) {
      const a = values[1 + 2 * k];
      const b = values[2 + 2 * k];
      let re: number;
      let im: number;
      if (format === 'RI') {
        re = a;
        im = b;
      } else {
        const magnitude = format === 'MA' ? a : 10 ** (a / 20);
        const angle = b * DEG_TO_RAD;
        re = magnitude * Math.cos(angle);
        im = magnitude * Math.sin(angle);
      }
      const target = targets[k];
      if (direct) {
        s.re[target][index] = re;
        s.im[target][index] = im;
      } else {
        converted![target] = { re: re * normalisation[target], im: im * normalisation[target] };
      }
    }
    for (const [from, to] of layout!.mirrors) {
      if (direct) {
        s.re[to][index] = s.re[from][index];
        s.im[to][index] = s.im[from][index];
      } else {
        converted![to] = converted![from];
      }
    }
    if (!direct) {
      const sMatrix = normalisedToS(parameter, state.ports!, converted!);
      for (let e = 0; e < sMatrix.length; e++) {
        s.re[e][index] = sMatrix[e].re;
        s.im[e][index] = sMatrix[e].im;
      }
    }
    // A huge dB value overflows 10^(dB/20), and Z or Y data can divide by zero on the way to S.
    for (let e = 0; e < s.elements; e++) {
      if (!Number.isFinite(s.re[e][index]) || !Number.isFinite(s.im[e][index])) {
        throw new TouchstoneError('TOUCHSTONE_BAD_NUMBER', lineNumber, `the values of this point give no finite S-parameter (too large a magnitude, or a singular ${parameter} matrix)`);
      }
    }
  };

  const addNoisePoint = (values: Float64Array, count: number, lineNumber: number) => {
    if (count !== 5) throw new TouchstoneError('TOUCHSTONE_DATA_LINE_LENGTH', lineNumber, `a noise data line needs 5 numbers, found ${count}`);
    const frequencyHz = values[0] * frequencyMultiplier;
    if (!(frequencyHz > state.lastNoiseFrequencyHz)) {
      throw new TouchstoneError('TOUCHSTONE_FREQUENCY_NOT_INCREASING', lineNumber, `noise frequency ${values[0]} does not increase`);
    }
    state.lastNoiseFrequencyHz = frequencyHz;
    state.noisePointCount++;
  };

  const portWord = (ports: number) => `${ports}-port`;

  const handleVersion1Data = (lineNumber: number) => {
    const count = numbers.count;
    if (state.ports === null) {
      if (!state.option) throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `data before the option line (# <unit> <parameter> <format> R <ohms>)`);
      // Version 1 has no port keyword: the file name, or else the first data line, says how many.
      const root = Math.round(Math.sqrt((count - 1) / 2));
      const impliedPorts = root >= 1 && 1 + 2 * root * root === count ? root : undefined;
      if (options.expectedPorts !== undefined && impliedPorts !== undefined && impliedPorts !== options.expectedPorts) {
        checkPorts(impliedPorts, lineNumber, 'this line holds data for');
      }
      const ports = options.expectedPorts ?? impliedPorts;
      if (ports === undefined) {
        throw new TouchstoneError('TOUCHSTONE_DATA_LINE_LENGTH', lineNumber, `a data line needs 3 numbers (1-port) or 9 (2-port), found ${count}`);
      }
      checkPorts(ports, lineNumber, 'the data are for');
      startNetworkData(lineNumber, ports as 1 | 2);
    }
    const ports = state.ports!;
    if (state.section === 'noise') {
      addNoisePoint(numbers.values, count, lineNumber);
      return;
    }
    if (count === valuesPerPoint) {
      addPoint(numbers.values, lineNumber);
      return;
    }
    // Version 1 2-port noise data start where the frequency stops increasing (Touchstone 1.1, Noise Parameter Data).
    if (ports === 2 && count === 5 && numbers.values[0] * frequencyMultiplier <= lastFrequencyHz) {
      state.section = 'noise';
      addNoisePoint(numbers.values, count, lineNumber);
      return;
    }
    throw new TouchstoneError(
      'TOUCHSTONE_DATA_LINE_LENGTH',
      lineNumber,
      `a ${portWord(ports)} data line needs ${valuesPerPoint} numbers${ports === 2 ? ' (or 5 in a noise block)' : ''}, found ${count}`,
    );
  };

  const flushPending = (lineNumber: number) => {
    if (pendingCount > 0) {
      throw new TouchstoneError('TOUCHSTONE_DATA_LINE_LENGTH', pendingLine, `a ${portWord(state.ports!)} data point needs ${valuesPerPoint} numbers, found ${pendingCount} before line ${lineNumber}`);
    }
  };

  const handleVersion2Data = (lineNumber: number) => {
    const count = numbers.count;
    if (state.section === 'noise') {
      addNoisePoint(numbers.values, count, lineNumber);
      return;
    }
    if (state.section !== 'network') {
      throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `data outside [Network Data] / [Noise Data]`);
    }
    if (pendingCount === 0 && count === valuesPerPoint) {
      addPoint(numbers.values, lineNumber);
      return;
    }
    if (pendingCount === 0) pendingLine = lineNumber;
    if (pendingCount + count > valuesPerPoint) {
      throw new TouchstoneError(
        'TOUCHSTONE_DATA_LINE_LENGTH',
        pendingLine,
        `a ${portWord(state.ports!)} data point needs ${valuesPerPoint} numbers, found ${pendingCount + count} (each frequency starts a new line)`,
      );
    }
    for (let k = 0; k < count; k++) pending[pendingCount + k] = numbers.values[k];
    pendingCount += count;
    if (pendingCount === valuesPerPoint) {
      addPoint(pending, pendingLine);
      pendingCount = 0;
    }
  };

  const handleReferenceValues = (text: string, lineNumber: number) => {
    for (const token of text.split(/\s+/).filter((t) => t.length > 0)) {
      const ohms = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(token) ? Number(token) : NaN;
      if (!(ohms > 0)) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Reference] needs positive resistances in ohms, found '${token}'`);
      if (state.referencePending === 0) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Reference] has more values than ports`);
      state.referenceOhms!.push(ohms);
      state.referencePending--;
    }
  };

  const handleKeyword = (text: string, lineNumber: number) => {
    const keyword = splitKeyword(text);
    if (!keyword) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `a keyword needs a closing ']'`);
    if (!state.isVersion2) {
      throw new TouchstoneError('TOUCHSTONE_UNKNOWN_KEYWORD', lineNumber, `keyword [${keyword.name}] needs [Version] 2.0 on the first line`);
    }
    if (state.section === 'information') {
      if (keyword.name === 'end information') state.section = 'header';
      return;
    }
    if (state.referencePending > 0) {
      throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', state.referenceLine, `[Reference] needs ${state.ports} values`);
    }
    const inHeader = state.section === 'header';
    const headerOnly = () => {
      if (!inHeader) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[${keyword.name}] must come before [Network Data]`);
    };
    switch (keyword.name) {
      case 'version':
        throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Version] must be the first keyword`);
      case 'number of ports': {
        headerOnly();
        const ports = positiveInteger(keyword.argument, '[Number of Ports]', lineNumber);
        checkPorts(ports, lineNumber, '[Number of Ports] says');
        state.ports = ports as 1 | 2;
        state.portsLine = lineNumber;
        return;
      }
      case 'two-port data order': {
        headerOnly();
        const order = keyword.argument.toUpperCase();
        if (order !== '12_21' && order !== '21_12') throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Two-Port Data Order] must be 12_21 or 21_12, found '${keyword.argument}'`);
        state.twoPortDataOrder = order;
        return;
      }
      case 'number of frequencies':
        headerOnly();
        state.frequencyCount = positiveInteger(keyword.argument, '[Number of Frequencies]', lineNumber);
        state.frequencyCountLine = lineNumber;
        return;
      case 'number of noise frequencies':
        headerOnly();
        state.noiseFrequencyCount = positiveInteger(keyword.argument, '[Number of Noise Frequencies]', lineNumber);
        return;
      case 'reference':
        headerOnly();
        if (state.ports === null) throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Reference] needs [Number of Ports] first`);
        state.referenceOhms = [];
        state.referencePending = state.ports;
        state.referenceLine = lineNumber;
        handleReferenceValues(keyword.argument, lineNumber);
        return;
      case 'matrix format': {
        headerOnly();
        const formatName = keyword.argument.toLowerCase();
        if (formatName !== 'full' && formatName !== 'lower' && formatName !== 'upper') {
          throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Matrix Format] must be Full, Lower or Upper, found '${keyword.argument}'`);
        }
        state.matrixFormat = formatName === 'full' ? 'Full' : formatName === 'lower' ? 'Lower' : 'Upper';
        return;
      }
      case 'begin information':
        headerOnly();
        state.section = 'information';
        return;
      case 'network data': {
        headerOnly();
        if (state.ports === null) throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Number of Ports] is required before [Network Data]`);
        if (state.ports === 2 && state.twoPortDataOrder === null) {
          throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Two-Port Data Order] is required for a 2-port file`);
        }
        if (state.frequencyCount === null) throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Number of Frequencies] is required before [Network Data]`);
        startNetworkData(lineNumber, state.ports);
        state.section = 'network';
        return;
      }
      case 'noise data':
        if (state.section !== 'network') throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Noise Data] must follow [Network Data]`);
        flushPending(lineNumber);
        state.section = 'noise';
        return;
      case 'end':
        if (state.section === 'header') throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[End] before [Network Data]`);
        flushPending(lineNumber);
        if (store!.length !== state.frequencyCount) {
          throw new TouchstoneError(
            'TOUCHSTONE_FREQUENCY_COUNT_MISMATCH',
            lineNumber,
            `[Number of Frequencies] on line ${state.frequencyCountLine} says ${state.frequencyCount} but [Network Data] holds ${store!.length}`,
          );
        }
        if (state.noiseFrequencyCount !== null && state.noisePointCount !== state.noiseFrequencyCount) {
          throw new TouchstoneError('TOUCHSTONE_NOISE_COUNT_MISMATCH', lineNumber, `[Number of Noise Frequencies] says ${state.noiseFrequencyCount} but [Noise Data] holds ${state.noisePointCount}`);
        }
        state.section = 'ended';
        return;
      default:
        throw new TouchstoneError('TOUCHSTONE_UNKNOWN_KEYWORD', lineNumber, `unknown or unsupported keyword [${keyword.name}]`);
    }
  };

  let lineNumber = 0;
  let position = 0;
  const length = bytes.length;
  const nextLine = (from: number): number => {
    let p = from;
    let c = 0;
    while (p < length && (c = bytes[p]) !== CHAR_LF && c !== CHAR_CR) p++;
    if (p < length) {
      p++;
      if (c === CHAR_CR && p < length && bytes[p] === CHAR_LF) p++;
    }
    return p;
  };
  /** Every line is measured after one linear pass and before any string is made of it. */
  const checkLineLength = (lineStart: number, lineEnd: number) => {
    if (lineEnd - lineStart > maxLineBytes) {
      throw new TouchstoneError('TOUCHSTONE_LINE_TOO_LONG', lineNumber, `the line is ${lineEnd - lineStart} bytes long; the limit is ${maxLineBytes}`);
    }
  };
  while (position < length && state.section !== 'ended') {
    lineNumber++;
    const lineStart = position;
    let first = position;
    while (first < length && isBlank(bytes[first])) first++;
    const lead = first < length ? bytes[first] : CHAR_LF;
    if (lead === CHAR_LF || lead === CHAR_CR || lead === CHAR_BANG) {
      position = nextLine(first);
      checkLineLength(lineStart, position);
      continue;
    }
    // Data lines, the bulk of a file, are scanned once: numbers straight from the bytes.
    const isNumberStart = (lead >= CHAR_0 && lead <= CHAR_9) || lead === CHAR_MINUS || lead === CHAR_PLUS || lead === CHAR_DOT;
    if (isNumberStart && state.section !== 'information' && state.referencePending === 0) {
      sawContent = true;
      position = nextLine(scanNumbers(bytes, first, numbers, lineNumber));
      checkLineLength(lineStart, position);
      if (state.isVersion2) handleVersion2Data(lineNumber);
      else handleVersion1Data(lineNumber);
      continue;
    }
    let contentEnd = first;
    while (contentEnd < length) {
      const c = bytes[contentEnd];
      if (c === CHAR_LF || c === CHAR_CR || c === CHAR_BANG) break;
      contentEnd++;
    }
    position = nextLine(contentEnd);
    checkLineLength(lineStart, position);
    if (state.section === 'information') {
      if (lead === CHAR_BRACKET) handleKeyword(latin1(bytes, first, contentEnd).trim(), lineNumber);
      continue;
    }
    if (!sawContent) {
      sawContent = true;
      if (lead === CHAR_BRACKET) {
        const keyword = splitKeyword(latin1(bytes, first, contentEnd).trim());
        if (!keyword || keyword.name !== 'version') {
          throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `a version-2 file must start with [Version]`);
        }
        if (keyword.argument !== '2.0' && keyword.argument !== '2.1') {
          throw new TouchstoneError('TOUCHSTONE_UNSUPPORTED_VERSION', lineNumber, `[Version] ${keyword.argument} is not supported (expected 2.0 or 2.1)`);
        }
        state.isVersion2 = true;
        state.version = keyword.argument;
        continue;
      }
    }
    if (lead === CHAR_HASH) {
      // Only the first option line counts (Touchstone 1.1 and 2.0, Option Line).
      if (!state.option) {
        if (state.isVersion2 && state.section !== 'header') {
          throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `the option line must come before [Network Data]`);
        }
        state.option = parseOptionLine(latin1(bytes, first, contentEnd), lineNumber);
      }
      continue;
    }
    if (lead === CHAR_BRACKET) {
      handleKeyword(latin1(bytes, first, contentEnd).trim(), lineNumber);
      continue;
    }
    if (state.referencePending > 0) {
      handleReferenceValues(latin1(bytes, first, contentEnd), lineNumber);
      continue;
    }
    // Anything else is a data line that does not start like a number.
    scanNumbers(bytes, first, numbers, lineNumber);
    if (state.isVersion2) handleVersion2Data(lineNumber);
    else handleVersion1Data(lineNumber);
  }

  if (!sawContent) throw new TouchstoneError('TOUCHSTONE_EMPTY', null, `the file is empty (no option line and no data)`);
  if (state.isVersion2 && state.section !== 'ended') {
    throw new TouchstoneError('TOUCHSTONE_MISSING_END', Math.max(lineNumber, 1), `a version-2 file must end with [End]`);
  }
  if (!state.option) throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', null, `the file has no option line (# <unit> <parameter> <format> R <ohms>)`);
  if (!store || (store as PointStore).length === 0) throw new TouchstoneError('TOUCHSTONE_EMPTY', null, `the file holds no data points`);
  const finished = store as PointStore;
  const option = state.option as OptionLine;
  return {
    version: state.version,
    ports: state.ports!,
    parameter: option.parameter,
    format: option.format,
    frequencyUnit: option.frequencyUnit,
    referenceOhms: state.referenceOhms!,
    twoPortDataOrder: state.ports === 2 ? (state.twoPortDataOrder ?? '21_12') : null,
    matrixFormat: state.matrixFormat,
    frequenciesHz: finished.frequenciesHz.slice(0, finished.length),
    s: finished.series(),
    noisePointCount: state.noisePointCount,
    pointLines: finished.lines.slice(0, finished.length),
  };
}
