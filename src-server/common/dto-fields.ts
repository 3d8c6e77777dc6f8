import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsBoolean, IsEmail, IsEnum, IsInt, IsNumber, IsOptional, IsString, Max, MaxLength, Min, MinLength,
} from 'class-validator';

/** One-line DTO fields: validation, query-string coercion and OpenAPI documentation together. */
interface FieldOptions {
  optional?: boolean;
  description?: string;
  example?: unknown;
}

function doc(opts: FieldOptions, extra: Record<string, unknown>) {
  const base = { description: opts.description, example: opts.example, ...extra };
  return opts.optional ? [ApiPropertyOptional(base), IsOptional()] : [ApiProperty(base)];
}

export function StringField(opts: FieldOptions & { minLength?: number; maxLength: number }) {
  return applyDecorators(
    ...doc(opts, { type: String, minLength: opts.minLength, maxLength: opts.maxLength }),
    IsString(),
    MinLength(opts.minLength ?? (opts.optional ? 0 : 1)),
    MaxLength(opts.maxLength),
  );
}

export function EmailField(opts: FieldOptions = {}) {
  return applyDecorators(
    ...doc(opts, { type: String, format: 'email', maxLength: 254 }),
    Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value)),
    IsEmail({}, { message: 'must be an e-mail address' }),
    MaxLength(254),
  );
}

export function IntField(opts: FieldOptions & { min?: number; max?: number }) {
  return applyDecorators(
    ...doc(opts, { type: Number, minimum: opts.min, maximum: opts.max }),
    Type(() => Number),
    IsInt(),
    ...(opts.min !== undefined ? [Min(opts.min)] : []),
    ...(opts.max !== undefined ? [Max(opts.max)] : []),
  );
}

export function NumberField(opts: FieldOptions & { min?: number; max?: number }) {
  return applyDecorators(
    ...doc(opts, { type: Number, minimum: opts.min, maximum: opts.max }),
    Type(() => Number),
    IsNumber({ allowNaN: false, allowInfinity: false }),
    ...(opts.min !== undefined ? [Min(opts.min)] : []),
    ...(opts.max !== undefined ? [Max(opts.max)] : []),
  );
}

export function EnumField<T extends string>(values: readonly T[], opts: FieldOptions = {}) {
  return applyDecorators(
    ...doc(opts, { enum: values }),
    IsEnum(Object.fromEntries(values.map((v) => [v, v])), { message: `must be one of: ${values.join(', ')}` }),
  );
}

export function BoolField(opts: FieldOptions = {}) {
  return applyDecorators(
    ...doc(opts, { type: Boolean }),
    Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value)),
    IsBoolean(),
  );
}
