import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { EnumField, NumberField, PatchType, StringField } from '../../common/dto-fields';
import { REGIONS } from '../../bands/band-domain';
import { LIMIT_KINDS, type LimitKind } from '../regulatory-limit.entity';

export class CreateRegulatoryLimitDto {
  @EnumField(REGIONS, { enumName: 'Region', example: 'EU' })
  region: string;

  @StringField({ maxLength: 160, example: 'SRD 869.4–869.65 MHz' })
  title: string;

  @NumberField({ min: 0.001, max: 300000 })
  fromMhz: number;

  @NumberField({ min: 0.001, max: 300000 })
  toMhz: number;

  @EnumField(LIMIT_KINDS, { enumName: 'LimitKind', description: 'eirp, erp, or conducted power with an antenna-gain rule' })
  kind: LimitKind;

  @NumberField({ min: -30, max: 60, description: 'The limit in dBm, unrounded (25 mW = 13.979 dBm)' })
  valueDbm: number;

  @StringField({ maxLength: 80, example: '25 mW e.r.p.' })
  valueText: string;

  @NumberField({ optional: true, nullable: true, min: -10, max: 40, description: 'conducted-gain-rule: gain above which power is reduced' })
  gainThresholdDbi?: number | null;

  @NumberField({
    optional: true,
    nullable: true,
    min: 0,
    max: 10,
    description: 'conducted-gain-rule: dB of power reduction per dB of gain above the threshold',
  })
  reductionDbPerDb?: number | null;

  @StringField({ optional: true, nullable: true, maxLength: 600 })
  conditions?: string | null;

  @StringField({ maxLength: 300, example: '47 CFR 15.247(b)(3), (b)(4)' })
  source: string;

  @StringField({ optional: true, nullable: true, maxLength: 600, description: 'Corroboration or from-memory tags' })
  note?: string | null;
}

export class UpdateRegulatoryLimitDto extends PatchType(CreateRegulatoryLimitDto) {}

export class RegulatoryLimitQueryDto {
  @EnumField(REGIONS, { enumName: 'Region', optional: true })
  region?: string;

  @NumberField({ optional: true, min: 0, max: 300000 })
  fromMhz?: number;

  @NumberField({ optional: true, min: 0, max: 300000 })
  toMhz?: number;
}

export class RegulatoryLimitDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: REGIONS, enumName: 'Region' }) region: string;
  @ApiProperty() title: string;
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ enum: LIMIT_KINDS, enumName: 'LimitKind' }) kind: LimitKind;
  @ApiProperty() valueDbm: number;
  @ApiProperty() valueText: string;
  @ApiPropertyOptional({ type: Number, nullable: true }) gainThresholdDbi: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true }) reductionDbPerDb: number | null;
  @ApiPropertyOptional({ type: String, nullable: true }) conditions: string | null;
  @ApiProperty() source: string;
  @ApiPropertyOptional({ type: String, nullable: true }) note: string | null;
  @ApiProperty() updatedAt: string;
}
