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
  | 'TOUCHSTONE_TOO_MANY_POINTS'
  | 'TOUCHSTONE_UNSUPPORTED';

/**
 * What kind of refusal: `too-large` is about the file's size, `malformed` about its content.
 * The API layer chooses the HTTP status from it (common/touchstone-http-error.ts).
 */
export type TouchstoneErrorKind = 'too-large' | 'malformed';

/** A file the reader refuses; `line` is 1-based, or null when the problem is the file as a whole. */
export class TouchstoneError extends Error {
  readonly code: TouchstoneErrorCode;
  readonly kind: TouchstoneErrorKind;
  readonly line: number | null;

  constructor(code: TouchstoneErrorCode, line: number | null, detail: string) {
    super(line === null ? detail : `line ${line}: ${detail}`);
    this.name = 'TouchstoneError';
    this.code = code;
    this.kind = code === 'TOUCHSTONE_TOO_LARGE' ? 'too-large' : 'malformed';
    this.line = line;
  }
}
