import { TouchstoneError } from './errors';

/**
 * Byte scanning of Touchstone lines. The scanner works on bytes and parses numbers by hand: regexes and
 * String.split per token cost several times more on 100,000-point files (measured in
 * src-server/bench/rf-bench.ts). Nothing here allocates per value.
 */

const CHAR_TAB = 9;
export const CHAR_LF = 10;
const CHAR_VT = 11;
const CHAR_FF = 12;
export const CHAR_CR = 13;
const CHAR_SPACE = 32;
export const CHAR_BANG = 33;
export const CHAR_HASH = 35;
export const CHAR_PLUS = 43;
const CHAR_COMMA = 44;
export const CHAR_MINUS = 45;
export const CHAR_DOT = 46;
export const CHAR_0 = 48;
export const CHAR_9 = 57;
const CHAR_E_UPPER = 69;
export const CHAR_BRACKET = 91;
const CHAR_E_LOWER = 101;

const POWERS_OF_TEN = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
const MAX_EXACT_MANTISSA = 2 ** 53;
/** More digits than this add nothing to a double (17 significant digits) and only cost time. */
const MAX_NUMBER_CHARACTERS = 64;

export function latin1(bytes: Uint8Array, start: number, end: number): string {
  let text = '';
  for (let i = start; i < end; i++) text += String.fromCharCode(bytes[i]);
  return text;
}

/** Numbers of one data line, parsed into a reusable buffer; `count` may exceed the buffer (then only counted). */
export class LineNumbers {
  readonly values: Float64Array;
  count = 0;

  constructor(capacity: number) {
    this.values = new Float64Array(capacity);
  }
}

/** Blanks between numbers: space, tab, VT, FF and (leniently) comma. */
export function isBlank(c: number): boolean {
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
export function scanNumbers(bytes: Uint8Array, start: number, out: LineNumbers, lineNumber: number): number {
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
        throw new TouchstoneError(
          'TOUCHSTONE_BAD_NUMBER',
          lineNumber,
          `a number of ${i - tokenStart} characters is too long (at most ${MAX_NUMBER_CHARACTERS})`,
        );
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

/** Where the line after the one holding `from` starts (LF, CR or CR LF ends a line). */
export function nextLineStart(bytes: Uint8Array, from: number): number {
  const length = bytes.length;
  let p = from;
  let c = 0;
  while (p < length && (c = bytes[p]) !== CHAR_LF && c !== CHAR_CR) p++;
  if (p < length) {
    p++;
    if (c === CHAR_CR && p < length && bytes[p] === CHAR_LF) p++;
  }
  return p;
}
