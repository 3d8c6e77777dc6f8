import type { IncomingMessage, ServerResponse } from 'node:http';
import { DomainError } from './domain-error';

/** Deeper than any body the API accepts (a rule's conditions are the deepest); keeps every recursive walk far from the stack limit. */
export const MAX_JSON_DEPTH = 64;

const OPEN_OBJECT = 0x7b,
  OPEN_ARRAY = 0x5b,
  CLOSE_OBJECT = 0x7d,
  CLOSE_ARRAY = 0x5d,
  QUOTE = 0x22,
  BACKSLASH = 0x5c,
  LETTER_U = 0x75;

const isHighSurrogate = (unit: number) => unit >= 0xd800 && unit <= 0xdbff;
const isLowSurrogate = (unit: number) => unit >= 0xdc00 && unit <= 0xdfff;

/** The code unit of a `\uXXXX` escape starting at `at` (the backslash), or -1 when there is none. */
function unicodeEscapeAt(text: string, at: number): number {
  if (text.charCodeAt(at) !== BACKSLASH || text.charCodeAt(at + 1) !== LETTER_U) return -1;
  const hex = text.slice(at + 2, at + 6);
  return hex.length === 4 && /^[0-9a-f]{4}$/i.test(hex) ? Number.parseInt(hex, 16) : -1;
}

/**
 * One linear pass over JSON text, before JSON.parse: refuses nesting deeper than `maxDepth` and `\u` escapes that
 * leave a lone UTF-16 surrogate (such strings cannot be stored as UTF-8). Syntax errors are left to JSON.parse.
 */
export function checkJsonText(text: string, maxDepth = MAX_JSON_DEPTH): void {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const unit = text.charCodeAt(i);
    if (!inString) {
      if (unit === QUOTE) inString = true;
      else if (unit === OPEN_OBJECT || unit === OPEN_ARRAY) {
        depth += 1;
        if (depth > maxDepth) {
          throw new DomainError('JSON_TOO_DEEP', `The request body nests objects and arrays deeper than ${maxDepth} levels`, 400, { maxDepth, position: i });
        }
      } else if (unit === CLOSE_OBJECT || unit === CLOSE_ARRAY) depth -= 1;
      continue;
    }
    if (unit === QUOTE) inString = false;
    else if (unit === BACKSLASH) {
      const escaped = unicodeEscapeAt(text, i);
      if (escaped === -1) {
        i += 1; // a one-character escape such as \" or \\
        continue;
      }
      if (isHighSurrogate(escaped) && isLowSurrogate(unicodeEscapeAt(text, i + 6))) {
        i += 11; // a valid surrogate pair: both escapes
      } else if (isHighSurrogate(escaped) || isLowSurrogate(escaped)) {
        throw new DomainError('JSON_BAD_UNICODE', 'The request body contains a \\u escape of an unpaired UTF-16 surrogate', 400, { position: i });
      } else {
        i += 5;
      }
    }
  }
}

/** body-parser's `verify` hook: runs on the raw body before JSON.parse; a thrown DomainError becomes the answer. */
export function verifyJsonBody(_req: IncomingMessage, _res: ServerResponse, body: Buffer, encoding: string): void {
  let text: string;
  try {
    text = new TextDecoder(encoding || 'utf-8').decode(body);
  } catch {
    throw new DomainError('UNSUPPORTED_CHARSET', `The request body's charset "${encoding}" is not supported; send UTF-8`, 415);
  }
  checkJsonText(text);
}
