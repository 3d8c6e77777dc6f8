import { ValidationError, ValidationPipe } from '@nestjs/common';
import { FieldProblem, ValidationFailedError } from './domain-error';

function flatten(errors: ValidationError[], prefix = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      // class-validator starts each message with the property name; keep the field separate.
      message: message.startsWith(`${error.property} `) ? message.slice(error.property.length + 1) : message,
    }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new ValidationFailedError(flatten(errors)),
  });
}
