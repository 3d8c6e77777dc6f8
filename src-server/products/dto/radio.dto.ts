import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsIn, IsOptional, ValidateNested } from 'class-validator';
import { ANTENNA_ROLES, type AntennaRole } from '../in-product/antenna-roles';
import { EnumField, IntField, NumberField, PatchType, StringField } from '../../common/dto-fields';
import { TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { BandDto } from '../../bands/dto/band-response.dto';
import { CONNECTORS, type Connector, POLARIZATIONS, type Polarization } from '../radio.entity';

export class RadioBandInputDto {
  @IntField({ min: 1, description: 'A band id from /api/bands' })
  bandId: number;

  @NumberField({
    optional: true,
    nullable: true,
    min: -20,
    max: 20,
    description: "The module's certified maximum antenna gain in this band (dBi); empty for receive-only radios",
  })
  certifiedMaxGainDbi?: number | null;
}

export class CreateRadioDto {
  @StringField({ maxLength: 120, example: 'Cellular LTE-M / NB-IoT' })
  name: string;

  @EnumField(TECHNOLOGIES, { enumName: 'Technology', description: 'LTE-M, NB-IoT and Cat-1 radios are lte; 5G is nr' })
  technology: Technology;

  @StringField({ maxLength: 160, example: 'Halvorn HM-410 (invented)' })
  module: string;

  @NumberField({
    optional: true,
    nullable: true,
    min: -40,
    max: 36,
    description: 'Conducted transmit power (dBm); must be empty for receive-only radios (GNSS)',
  })
  transmitPowerDbm?: number | null;

  @EnumField(POLARIZATIONS, { enumName: 'RadioPolarization' })
  polarization: Polarization;

  @EnumField(CONNECTORS, { enumName: 'Connector' })
  connector: Connector;

  @NumberField({ min: 0, max: 20, description: 'Cable or feed loss between module and antenna (dB)' })
  feedLossDb: number;

  @StringField({ optional: true, nullable: true, maxLength: 4000 })
  notes?: string | null;

  @ApiPropertyOptional({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', isArray: true, description: 'The antennas the radio needs, main first; default [main]' })
  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(ANTENNA_ROLES.length)
  @ArrayUnique()
  @IsIn(ANTENNA_ROLES, { each: true })
  antennaRoles?: AntennaRole[];

  @ApiProperty({ type: [RadioBandInputDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(80)
  @ValidateNested({ each: true })
  @Type(() => RadioBandInputDto)
  bands: RadioBandInputDto[];
}

export class UpdateRadioDto extends PatchType(CreateRadioDto) {
  @IntField({ min: 1, description: 'The version you edited; a stale one gets 409 RADIO_VERSION_CONFLICT' })
  version: number;
}

export class RadioBandDto {
  @ApiProperty({ type: BandDto }) band: BandDto;
  @ApiPropertyOptional({ type: Number, nullable: true }) certifiedMaxGainDbi: number | null;
}

export class RadioDto {
  @ApiProperty() id: number;
  @ApiProperty() productId: number;
  @ApiProperty() name: string;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology' }) technology: Technology;
  @ApiProperty() module: string;
  @ApiProperty() receiveOnly: boolean;
  @ApiPropertyOptional({ type: Number, nullable: true }) transmitPowerDbm: number | null;
  @ApiProperty({ enum: POLARIZATIONS, enumName: 'RadioPolarization' }) polarization: Polarization;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector' }) connector: Connector;
  @ApiProperty() feedLossDb: number;
  @ApiProperty({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', isArray: true, description: 'The antennas the radio needs, main first' })
  antennaRoles: AntennaRole[];
  @ApiPropertyOptional({ type: String, nullable: true }) notes: string | null;
  @ApiProperty() version: number;
  @ApiProperty({ type: [RadioBandDto] }) bands: RadioBandDto[];
  @ApiProperty() updatedAt: string;
}
