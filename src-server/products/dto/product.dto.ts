import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, ValidateBy } from 'class-validator';
import { BoolField, IntField, NumberField, OptionalField, PatchType, StringField } from '../../common/dto-fields';
import { REGIONS, TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { REGION_MESSAGE } from '../../bands/regions';
import { RadioDto } from './radio.dto';

/** 'all', or a list of pairs of two different radio ids. */
export type SimultaneousTransmit = 'all' | number[][];

const MAX_TRANSMIT_PAIRS = 200;

function isSimultaneousTransmit(value: unknown): boolean {
  if (value === 'all') return true;
  if (!Array.isArray(value) || value.length > MAX_TRANSMIT_PAIRS) return false;
  return value.every(
    (pair) => Array.isArray(pair) && pair.length === 2 && pair.every((id) => Number.isInteger(id) && id >= 1 && id <= 2 ** 31) && pair[0] !== pair[1],
  );
}

export class CreateProductDto {
  @StringField({ maxLength: 120, example: 'Livestock tracker (collar unit)' })
  name: string;

  @StringField({ maxLength: 40, example: 'DEMO-LT1', description: 'Unique product code' })
  code: string;

  @StringField({ maxLength: 120, example: 'Eli Marsh' })
  owner: string;

  @NumberField({ min: 1, max: 2000, description: 'Ground-plane (board) length in mm' })
  groundPlaneLengthMm: number;

  @NumberField({ min: 1, max: 2000, description: 'Ground-plane (board) width in mm' })
  groundPlaneWidthMm: number;

  @ApiProperty({
    enum: REGIONS,
    enumName: 'Region',
    isArray: true,
    example: ['EU', 'US'],
    description: 'Target markets: ISO 3166-1 alpha-2 codes, groupings (EU, CEPT, ASIA) or global',
  })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(REGIONS.length)
  @IsIn(REGIONS, { each: true, message: REGION_MESSAGE })
  targetRegions: string[];

  @StringField({ optional: true, nullable: true, maxLength: 4000 })
  notes?: string | null;

  @ApiPropertyOptional({
    oneOf: [
      { type: 'string', enum: ['all'] },
      { type: 'array', items: { type: 'array', items: { type: 'integer' }, minItems: 2, maxItems: 2 } },
    ],
    example: [[11, 12]],
    description:
      "Which radios may transmit at the same time, for the intermodulation check: 'all' (the default) or pairs of radio ids of this product; an empty list means no two radios transmit together",
  })
  @OptionalField()
  @ValidateBy({
    name: 'isSimultaneousTransmit',
    validator: {
      validate: isSimultaneousTransmit,
      defaultMessage: () => `must be 'all' or a list of at most ${MAX_TRANSMIT_PAIRS} pairs of two different radio ids`,
    },
  })
  simultaneousTransmit?: SimultaneousTransmit;
}

export class UpdateProductDto extends PatchType(CreateProductDto) {
  @IntField({ min: 1, description: 'The version you edited; a stale one gets 409 PRODUCT_VERSION_CONFLICT' })
  version: number;
}

export class VersionQueryDto {
  @IntField({ optional: true, min: 1, description: 'When given, the delete only happens if this is still the current version' })
  version?: number;
}

export class ProductListQueryDto {
  @BoolField({ optional: true, description: 'true: the deleted products instead, newest deletion first (admin)' })
  deleted?: boolean;
}

/** A user as other records name them: a name, never an e-mail address. */
export class PersonRefDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

export class ProductSummaryDto extends OmitType(CreateProductDto, ['notes', 'simultaneousTransmit'] as const) {
  @ApiProperty() id: number;
  @ApiProperty({
    oneOf: [
      { type: 'string', enum: ['all'] },
      { type: 'array', items: { type: 'array', items: { type: 'integer' } } },
    ],
    description: "'all', or the pairs of radio ids that may transmit at the same time",
  })
  simultaneousTransmit: SimultaneousTransmit;
  @ApiPropertyOptional({ type: String, nullable: true }) notes: string | null;
  @ApiProperty() version: number;
  @ApiProperty() radioCount: number;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology', isArray: true, description: 'Technologies of its radios' }) technologies: Technology[];
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
  @ApiProperty({
    type: PersonRefDto,
    nullable: true,
    description: 'Who created it; null when unknown (seeded or older products). The creator and admins may delete it.',
  })
  createdBy: PersonRefDto | null;
  @ApiProperty({ type: String, nullable: true, description: 'Set when the product was deleted; an admin can restore it' }) deletedAt: string | null;
  @ApiProperty({ type: PersonRefDto, nullable: true }) deletedBy: PersonRefDto | null;
}

export class ProductDetailDto extends ProductSummaryDto {
  @ApiProperty({ type: [RadioDto] }) radios: RadioDto[];
}
