import { applyDecorators, type Type } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type as TransformType } from 'class-transformer';
import {
  IsBoolean,
  IsEmail,
  IsEnum,
  IsInt,
  IsISO8601,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  NotEquals,
  ValidateBy,
  ValidateIf,
} from 'class-validator';

/** One-line DTO fields: validation, query-string coercion and OpenAPI documentation together. */
interface FieldOptions {
  /** May be left out. A present `null` is still refused unless `nullable` is set too. */
  optional?: boolean;
  /** `null` is a value (it clears the field); only for columns that may be empty. */
  nullable?: boolean;
  description?: string;
  example?: unknown;
  /** Names a shared vocabulary in OpenAPI, so that generated client types get one named type for it. */
  enumName?: string;
}

/**
 * Left out (undefined) skips the field's checks; `null` is refused with the field's name unless it is nullable.
 * Use it for hand-written optional fields; PATCH DTOs use `PatchType` below.
 */
export function OptionalField(opts: { nullable?: boolean } = {}) {
  return opts.nullable
    ? IsOptional()
    : applyDecorators(
        ValidateIf((_, value) => value !== undefined),
        NotEquals(null, { message: 'must not be null' }),
      );
}

function doc(opts: FieldOptions, extra: Record<string, unknown>) {
  const base = { description: opts.description, example: opts.example, ...(opts.nullable ? { nullable: true } : {}), ...extra };
  return opts.optional || opts.nullable ? [ApiPropertyOptional(base), OptionalField(opts)] : [ApiProperty(base)];
}

/**
 * PartialType for PATCH bodies: every field may be left out, but `null` is refused for fields that are not nullable
 * (Nest's default PartialType lets `null` through to a NOT NULL column).
 */
export function PatchType<T>(classRef: Type<T>) {
  return PartialType(classRef, { skipNullProperties: false });
}

/** Database INT range: an integer field without its own bounds must still fit a column. */
export const INT_MIN = -2_147_483_648;
export const INT_MAX = 2_147_483_647;

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

/** An integer; without bounds of its own it must still fit a database INT, so `1e20` is a 400, not a 500. */
export function IntField(opts: FieldOptions & { min?: number; max?: number }) {
  const min = Math.max(opts.min ?? INT_MIN, INT_MIN);
  const max = Math.min(opts.max ?? INT_MAX, INT_MAX);
  return applyDecorators(
    ...doc(opts, { type: Number, minimum: min, maximum: max }),
    TransformType(() => Number),
    IsInt(),
    Min(min),
    Max(max),
  );
}

/** A finite number within bounds every caller states, so no value the column cannot hold gets through. */
export function NumberField(opts: FieldOptions & { min: number; max: number }) {
  return applyDecorators(
    ...doc(opts, { type: Number, minimum: opts.min, maximum: opts.max }),
    TransformType(() => Number),
    IsNumber({ allowNaN: false, allowInfinity: false }),
    Min(opts.min),
    Max(opts.max),
  );
}

export function EnumField<T extends string>(values: readonly T[], opts: FieldOptions = {}) {
  return applyDecorators(
    ...doc(opts, { enum: values, ...(opts.enumName ? { enumName: opts.enumName } : {}) }),
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

/** Calendar dates the product records (sourcing checks, and the like): wide enough for history, narrow enough to catch typos. */
export const DATE_YEARS = { min: 1970, max: 2199 } as const;

/** A `YYYY-MM-DD` date that exists in the calendar (no 2025-02-31 or 0000-00-00) within DATE_YEARS. */
export function DateField(opts: FieldOptions = {}) {
  const shape = `must be a date like 2025-11-20 (a real day between ${DATE_YEARS.min} and ${DATE_YEARS.max})`;
  return applyDecorators(
    ...doc(opts, { type: String, format: 'date', example: opts.example ?? '2025-11-20' }),
    Matches(/^\d{4}-\d{2}-\d{2}$/, { message: shape }),
    IsISO8601({ strict: true }, { message: shape }),
    ValidateBy({
      name: 'dateInYearRange',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && Number(value.slice(0, 4)) >= DATE_YEARS.min && Number(value.slice(0, 4)) <= DATE_YEARS.max,
        defaultMessage: () => shape,
      },
    }),
  );
}
