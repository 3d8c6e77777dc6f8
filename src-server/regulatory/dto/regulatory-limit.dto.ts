import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn } from 'class-validator';
import { EnumField, NumberField, OptionalField, PatchType, StringField } from '../../common/dto-fields';
import { REGIONS, TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { LIMIT_KINDS, type LimitKind } from '../regulatory-limit.entity';

export class CreateRegulatoryLimitDto {
  @EnumField(REGIONS, { enumName: 'Region', example: 'EU', description: 'ISO 3166-1 alpha-2 code, a grouping (EU, CEPT, ASIA) or global' })
  region: string;

  @ApiPropertyOptional({
    enum: TECHNOLOGIES,
    enumName: 'Technology',
    isArray: true,
    example: ['wifi', 'ble', 'ism', 'other'],
    description:
      'The radio technologies (services) the limit governs; a limit is judged only on radios of these technologies. Left out: the licence-exempt ones (wifi, ble, ism, other)',
  })
  @OptionalField()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(TECHNOLOGIES.length)
  @IsIn(TECHNOLOGIES, { each: true, message: `each value must be one of: ${TECHNOLOGIES.join(', ')}` })
  technologies?: Technology[];

  @StringField({ maxLength: 160, example: 'SRD 869.4–869.65 MHz' })
  title: string;

  @NumberField({ min: 0.001, max: 300000 })
  fromMhz: number;

  @NumberField({ min: 0.001, max: 300000 })
  toMhz: number;

  @EnumField(LIMIT_KINDS, {
    enumName: 'LimitKind',
    description: 'eirp, erp, conducted power at the radio port, or conducted power with an antenna-gain rule',
  })
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

  @EnumField(TECHNOLOGIES, { enumName: 'Technology', optional: true, description: 'Only limits that govern this technology' })
  technology?: Technology;

  @NumberField({ optional: true, min: 0, max: 300000 })
  fromMhz?: number;

  @NumberField({ optional: true, min: 0, max: 300000 })
  toMhz?: number;
}

export class RegulatoryLimitDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: REGIONS, enumName: 'Region' }) region: string;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology', isArray: true }) technologies: Technology[];
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
