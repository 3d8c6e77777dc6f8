import { ValidationError, ValidationPipe } from '@nestjs/common';
import { FieldProblem, ValidationFailedError } from './domain-error';

/** class-validator's error tree as { field, message } pairs, nested fields as `a.0.b`. */
export function flattenValidationErrors(errors: ValidationError[], prefix = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      // class-validator starts each message with the property name; keep the field separate.
      message: message.startsWith(`${error.property} `) ? message.slice(error.property.length + 1) : message,
    }));
    return [...own, ...flattenValidationErrors(error.children ?? [], field)];
  });
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new ValidationFailedError(flattenValidationErrors(errors)),
  });
}
