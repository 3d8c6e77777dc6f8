import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, Max, Min } from 'class-validator';
import { INT_MAX, PatchType, StringField } from '../../common/dto-fields';
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

export class UpdateBandSetDto extends PatchType(CreateBandSetDto) {}

export class BandSetDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() description: string;
  @ApiProperty({ type: [Number] }) bandIds: number[];
  @ApiProperty({ type: [BandRefDto] }) bands: BandRefDto[];
  @ApiProperty() updatedAt: string;
}
