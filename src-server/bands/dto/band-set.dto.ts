import { ApiProperty, PartialType } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, Min } from 'class-validator';
import { IntField, StringField } from '../../common/dto-fields';
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
  bandIds: number[];
}

export class UpdateBandSetDto extends PartialType(CreateBandSetDto) {
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
