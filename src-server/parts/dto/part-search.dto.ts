import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, Matches } from 'class-validator';
import { EnumField, IntField, NumberField, StringField } from '../../common/dto-fields';
import { SORT_KEYS, type SortKey } from '../catalogue/catalogue-index/catalogue-index';
import {
  CONNECTORS,
  type Connector,
  FORM_FACTORS,
  type FormFactor,
  LIFECYCLES,
  type Lifecycle,
  POLARIZATIONS,
  type PartPolarization,
  REVIEW_STATES,
  type ReviewState,
} from '../part.types';

/** A comma-separated query list of enum values, e.g. `status=approved,restricted`. */
export function ListField(values: readonly string[], description: string) {
  return applyDecorators(
    ApiPropertyOptional({ description: `${description}; comma-separated: ${values.join(', ')}`, type: String }),
    IsOptional(),
    Transform(({ value }) =>
      typeof value === 'string'
        ? value
            .split(',')
            .map((v) => v.trim())
            .filter(Boolean)
        : value,
    ),
    IsIn(values as string[], { each: true, message: `each value must be one of: ${values.join(', ')}` }),
  );
}

export class PartSearchDto {
  @StringField({ optional: true, maxLength: 200, description: 'Words that must all appear in manufacturer, MPN, title or notes' }) q?: string;
  @ListField(FORM_FACTORS, 'Form factors') formFactor?: FormFactor[];
  @ListField(CONNECTORS, 'Connectors') connector?: Connector[];
  @ListField(POLARIZATIONS, 'Polarizations') polarization?: PartPolarization[];
  @ListField(REVIEW_STATES, 'Review states (procurement sees approved only unless it asks)') status?: ReviewState[];
  @ListField(LIFECYCLES, 'Lifecycle states') lifecycle?: Lifecycle[];
  @NumberField({ optional: true, min: 0, max: 1e7, description: 'Highest acceptable lowest unit price, in `currency`' }) priceMax?: number;

  @ApiPropertyOptional({ example: 'USD', description: 'Currency of priceMax and of the price sort (default USD)' })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'must be a three-letter currency code such as USD' })
  currency?: string;

  @ApiPropertyOptional({ example: '791-862,880-960', description: 'Frequency ranges in MHz the part must cover, comma-separated from-to pairs' })
  @IsOptional()
  @Matches(/^\s*\d+(\.\d+)?\s*-\s*\d+(\.\d+)?\s*(,\s*\d+(\.\d+)?\s*-\s*\d+(\.\d+)?\s*){0,15}$/, {
    message: 'must be ranges in MHz like 791-862,880-960 (at most 16)',
  })
  covers?: string;

  @NumberField({ optional: true, min: 1, max: 100, description: 'Worst VSWR allowed over every covered range (default 2)' }) vswrMax?: number;
  @NumberField({ optional: true, min: 0, max: 100, description: 'Lowest radiation efficiency allowed over every covered range, %' }) minEfficiencyPct?: number;
  @EnumField(SORT_KEYS, { optional: true }) sort?: SortKey;
  @EnumField(['asc', 'desc'] as const, { optional: true }) order?: 'asc' | 'desc';
  @IntField({ optional: true, min: 1, max: 200, description: 'Page size (default 50)' }) limit?: number;
  @IntField({ optional: true, min: 0, max: 1_000_000 }) offset?: number;
}
