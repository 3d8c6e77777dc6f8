import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, ValidateNested } from 'class-validator';
import { EnumField, NumberField, PatchType, StringField } from '../../common/dto-fields';
import { DUPLEX_MODES, type DuplexMode, RANGE_ROLES, type RangeRole, REGIONS, TECHNOLOGIES, type Technology } from '../band-domain';
import { REGION_MESSAGE } from '../regions';

export class BandRangeInputDto {
  @EnumField(RANGE_ROLES, { enumName: 'RangeRole' })
  role: RangeRole;

  @NumberField({ min: 0.001, max: 300000, example: 699 })
  fromMhz: number;

  @NumberField({ min: 0.001, max: 300000, example: 716 })
  toMhz: number;
}

export class CreateBandDto {
  @EnumField(TECHNOLOGIES, { enumName: 'Technology' })
  technology: Technology;

  @StringField({ maxLength: 40, example: 'B12' })
  designation: string;

  @StringField({ maxLength: 160 })
  name: string;

  @EnumField(DUPLEX_MODES, { enumName: 'DuplexMode' })
  duplex: DuplexMode;

  @ApiProperty({ type: [BandRangeInputDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(8)
  @ValidateNested({ each: true })
  @Type(() => BandRangeInputDto)
  ranges: BandRangeInputDto[];

  @NumberField({ optional: true, nullable: true, min: 0.001, max: 300000 })
  centreMhz?: number | null;

  @NumberField({ optional: true, nullable: true, min: 0.001, max: 300000 })
  bandwidthMhz?: number | null;

  @NumberField({ optional: true, nullable: true, min: 0.001, max: 300000, description: 'GNSS only: lower edge of the main lobe of the open-service signal' })
  mainLobeFromMhz?: number | null;

  @NumberField({ optional: true, nullable: true, min: 0.001, max: 300000, description: 'GNSS only: upper edge of the main lobe' })
  mainLobeToMhz?: number | null;

  @ApiProperty({ enum: REGIONS, enumName: 'Region', isArray: true })
  @IsArray()
  @ArrayMaxSize(REGIONS.length)
  @IsIn(REGIONS, { each: true, message: REGION_MESSAGE })
  regions: string[];

  @StringField({ maxLength: 200, example: '3GPP TS 36.101' })
  sourceDocument: string;

  @StringField({ maxLength: 200, example: 'Table 5.5-1' })
  sourceTable: string;

  @StringField({ optional: true, nullable: true, maxLength: 600 })
  sourceNote?: string | null;
}

export class UpdateBandDto extends PatchType(CreateBandDto) {}
