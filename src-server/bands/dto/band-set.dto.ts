import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, Max, Min } from 'class-validator';
import { INT_MAX, IntField, PatchType, StringField } from '../../common/dto-fields';
import { BandRefDto } from './band-response.dto';

export class CreateBandSetDto {
  @StringField({ maxLength: 120, example: 'LTE-M Europe (example)' })
  name: string;

  @StringField({ maxLength: 4000, description: 'Say where the list comes from and that operators must be checked' })
  description: string;

  @ApiProperty({ type: [Number], example: [103, 108, 120] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(100)
  @IsInt({ each: true, message: 'each value must be an integer band id' })
  @Min(1, { each: true, message: 'each value must be a positive band id' })
  @Max(INT_MAX, { each: true, message: 'each value must be a band id' })
  bandIds: number[];
}

export class UpdateBandSetDto extends PatchType(CreateBandSetDto) {
  @IntField({ min: 1, description: 'The version you edited; a stale one gets 409 BAND_SET_VERSION_CONFLICT' })
  version: number;
}

export class BandSetVersionQueryDto {
  @IntField({ optional: true, min: 1, description: 'When given, the delete only happens if this is still the current version' })
  version?: number;
}

export class BandSetDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() description: string;
  @ApiProperty({ type: [Number] }) bandIds: number[];
  @ApiProperty({ type: [BandRefDto] }) bands: BandRefDto[];
  @ApiProperty() version: number;
  @ApiProperty() updatedAt: string;
}
