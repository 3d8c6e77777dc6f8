import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, Matches, ValidateNested } from 'class-validator';
import { DateField, EnumField, IntField, OptionalField, StringField } from '../../common/dto-fields';
import { ALTERNATE_KINDS, type AlternateKind } from '../part.types';

export class PriceBreakInputDto {
  @IntField({ min: 1, max: 100_000_000, example: 1000 }) quantity: number;

  @ApiProperty({ example: '0.4200', description: 'Unit price as a decimal string (up to 4 decimals)' })
  @Matches(/^\d{1,10}(\.\d{1,4})?$/, { message: 'must be a decimal amount such as 0.42 (up to 4 decimals)' })
  unitPrice: string;
}

class OfferFieldsDto {
  @StringField({ optional: true, nullable: true, maxLength: 80 }) sku?: string | null;
  @IntField({ optional: true, nullable: true, min: 1, max: 100_000_000 }) moq?: number | null;
  @IntField({ optional: true, nullable: true, min: 0, max: 3650 }) leadTimeDays?: number | null;
  @IntField({ optional: true, nullable: true, min: 0, max: 2_000_000_000, description: 'Pieces in stock when last checked' }) stock?: number | null;

  @DateField({ optional: true, nullable: true })
  lastCheckedOn?: string | null;
}

export class CreateOfferDto extends OfferFieldsDto {
  @StringField({ maxLength: 120, example: 'Brightwater Components' }) supplier: string;

  @ApiProperty({ example: 'USD' })
  @Matches(/^[A-Z]{3}$/, { message: 'must be a three-letter currency code such as USD' })
  currency: string;

  @ApiProperty({ type: [PriceBreakInputDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(20)
  @ValidateNested({ each: true })
  @Type(() => PriceBreakInputDto)
  priceBreaks: PriceBreakInputDto[];
}

export class UpdateOfferDto extends OfferFieldsDto {
  @IntField({ min: 1, description: 'The version you edited' }) version: number;
  @StringField({ optional: true, maxLength: 120 }) supplier?: string;

  @ApiProperty({ required: false, example: 'EUR' })
  @OptionalField()
  @Matches(/^[A-Z]{3}$/, { message: 'must be a three-letter currency code such as USD' })
  currency?: string;

  @ApiProperty({ type: [PriceBreakInputDto], required: false })
  @OptionalField()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(20)
  @ValidateNested({ each: true })
  @Type(() => PriceBreakInputDto)
  priceBreaks?: PriceBreakInputDto[];
}

export class AlternateInputDto {
  @EnumField(ALTERNATE_KINDS, { enumName: 'AlternateKind' }) kind: AlternateKind;
  @StringField({ optional: true, maxLength: 300 }) note?: string;
}
