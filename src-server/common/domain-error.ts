/** A failure the user can act on. The string code is the contract; the wording may change. */
export class DomainError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number = 400,
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export class NotFoundError extends DomainError {
  constructor(what: string, id: string | number) {
    super(`${what.toUpperCase().replace(/[^A-Z]+/g, '_')}_NOT_FOUND`, `${what} ${id} was not found`, 404);
  }
}

export class VersionConflictError extends DomainError {
  constructor(what: string, id: string | number, expected: number, actual: number) {
    super(
      `${what.toUpperCase().replace(/[^A-Z]+/g, '_')}_VERSION_CONFLICT`,
      `${what} ${id} was changed by someone else (you edited version ${expected}, it is now version ${actual}); reload and try again`,
      409,
      { expectedVersion: expected, currentVersion: actual },
    );
  }
}

export interface FieldProblem {
  field: string;
  message: string;
}

export class ValidationFailedError extends DomainError {
  constructor(readonly fields: FieldProblem[]) {
    super('VALIDATION_FAILED', fields.map((f) => `${f.field}: ${f.message}`).join('; '), 400, { fields });
  }
}
