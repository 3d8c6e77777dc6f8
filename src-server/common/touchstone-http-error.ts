import { TouchstoneError, type TouchstoneErrorKind } from '../rf/touchstone';
import { DomainError } from './domain-error';

/** The API's status for each kind of refused Touchstone file: its size, or its content. */
const STATUS_BY_KIND: Readonly<Record<TouchstoneErrorKind, number>> = { 'too-large': 413, malformed: 422 };

/** A refused Touchstone file as the API answers it: the reader's code and line, the status chosen here. */
export function touchstoneHttpError(error: TouchstoneError): DomainError {
  return new DomainError(error.code, error.message, STATUS_BY_KIND[error.kind], { line: error.line });
}

/** Runs a read of an uploaded Touchstone file; the reader's refusal leaves as a 413 or 422 naming the line. */
export function withTouchstoneStatus<T>(read: () => T): T {
  try {
    return read();
  } catch (error) {
    if (error instanceof TouchstoneError) throw touchstoneHttpError(error);
    throw error;
  }
}
