import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsIn, ValidateNested } from 'class-validator';
import { ANTENNA_ROLES, type AntennaRole } from '../in-product/antenna-roles';
import { EnumField, IntField, NumberField, OptionalField, PatchType, StringField } from '../../common/dto-fields';
import { GNSS_BANDWIDTHS, type GnssBandwidth, TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { BandDto } from '../../bands/dto/band-response.dto';
import { CONNECTORS, type Connector, POLARIZATIONS, type Polarization } from '../radio.entity';

/** A channel the radio uses: an edge pair, or a centre and bandwidth (exactly one of the two forms). */
export class RadioChannelInputDto {
  @NumberField({ optional: true, min: 0.001, max: 300000, description: 'Lower edge (MHz); with toMhz' })
  fromMhz?: number;

  @NumberField({ optional: true, min: 0.001, max: 300000, description: 'Upper edge (MHz); with fromMhz' })
  toMhz?: number;

  @NumberField({ optional: true, min: 0.001, max: 300000, description: 'Centre frequency (MHz); with bandwidthMhz', example: 869.525 })
  centreMhz?: number;

  @NumberField({ optional: true, min: 0.000001, max: 10000, description: 'Occupied bandwidth (MHz); with centreMhz', example: 0.25 })
  bandwidthMhz?: number;
}

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

  @ApiPropertyOptional({
    type: [RadioChannelInputDto],
    nullable: true,
    description:
      "The channels the radio uses in this band, inside its transmit ranges; power limits are then judged on these channels' sub-bands instead of the tightest sub-band anywhere in the band. Empty or null: the whole band",
  })
  @OptionalField({ nullable: true })
  @IsArray()
  @ArrayMaxSize(64)
  @ValidateNested({ each: true })
  @Type(() => RadioChannelInputDto)
  channels?: RadioChannelInputDto[] | null;
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

  @EnumField(GNSS_BANDWIDTHS, {
    enumName: 'GnssBandwidth',
    optional: true,
    nullable: true,
    description: 'GNSS only: judge each signal on its main lobe (default) or its full signal band; leave empty for other radios',
  })
  gnssBandwidth?: GnssBandwidth | null;

  @StringField({ optional: true, nullable: true, maxLength: 4000 })
  notes?: string | null;

  @ApiPropertyOptional({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', isArray: true, description: 'The antennas the radio needs, main first; default [main]' })
  @OptionalField()
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

export class RadioChannelDto {
  @ApiProperty({ example: 869.4 }) fromMhz: number;
  @ApiProperty({ example: 869.65 }) toMhz: number;
}

export class RadioBandDto {
  @ApiProperty({ type: BandDto }) band: BandDto;
  @ApiPropertyOptional({ type: Number, nullable: true }) certifiedMaxGainDbi: number | null;
  @ApiPropertyOptional({ type: [RadioChannelDto], nullable: true, description: 'The channels the radio uses (edges in MHz); null: the whole band' })
  channels: RadioChannelDto[] | null;
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
  @ApiPropertyOptional({ enum: GNSS_BANDWIDTHS, enumName: 'GnssBandwidth', nullable: true, description: 'GNSS radios: main-lobe or full-band; null otherwise' })
  gnssBandwidth: GnssBandwidth | null;
  @ApiProperty({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', isArray: true, description: 'The antennas the radio needs, main first' })
  antennaRoles: AntennaRole[];
  @ApiPropertyOptional({ type: String, nullable: true }) notes: string | null;
  @ApiProperty() version: number;
  @ApiProperty({ type: [RadioBandDto] }) bands: RadioBandDto[];
  @ApiProperty() updatedAt: string;
}
