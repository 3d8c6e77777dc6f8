import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, ValidateNested } from 'class-validator';
import { EnumField, IntField, NumberField, OptionalField, StringField } from '../../common/dto-fields';
import {
  CONNECTORS,
  type Connector,
  EFFICIENCY_BASES,
  type EfficiencyBasis,
  FIGURE_STATISTICS,
  type FigureStatistic,
  FORM_FACTORS,
  type FormFactor,
  GAIN_BASES,
  type GainBasis,
  LIFECYCLES,
  type Lifecycle,
  POLARIZATIONS,
  type PartPolarization,
} from '../part.types';

/** What a datasheet line means when it does not say: most datasheets quote total efficiency averaged over the band, and the antenna's peak gain (common practice). */
export const SPEC_BAND_DEFAULTS = { efficiencyBasis: 'total', efficiencyStatistic: 'average', gainBasis: 'peak' } as const satisfies {
  efficiencyBasis: EfficiencyBasis;
  efficiencyStatistic: FigureStatistic;
  gainBasis: GainBasis;
};

export class SpecBandInputDto {
  @NumberField({ min: 1, max: 300000, example: 791, description: 'Lower edge, MHz' }) fromMhz: number;
  @NumberField({ min: 1, max: 300000, example: 862, description: 'Upper edge, MHz' }) toMhz: number;
  @NumberField({ optional: true, nullable: true, min: 1, max: 100, example: 2.5 }) maxVswr?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 80, example: 7.4 }) minReturnLossDb?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 100, example: 45 }) efficiencyPct?: number | null;
  @EnumField(EFFICIENCY_BASES, {
    enumName: 'EfficiencyBasis',
    optional: true,
    description: 'What efficiencyPct includes: radiation (mismatch left out) or total (mismatch included); default total, as most datasheets quote',
  })
  efficiencyBasis?: EfficiencyBasis;
  @EnumField(FIGURE_STATISTICS, {
    enumName: 'FigureStatistic',
    optional: true,
    description: "Whether efficiencyPct is the band's minimum or its average; default average, as most datasheets quote",
  })
  efficiencyStatistic?: FigureStatistic;
  @NumberField({ optional: true, nullable: true, min: -60, max: 40, example: 1.5 }) peakGainDbi?: number | null;
  @NumberField({ optional: true, nullable: true, min: -60, max: 40, example: -2 }) averageGainDbi?: number | null;
  @EnumField(GAIN_BASES, {
    enumName: 'GainBasis',
    optional: true,
    description: "What the gains include: peak (the antenna's gain, mismatch left out) or realized (mismatch included); default peak",
  })
  gainBasis?: GainBasis;
}

/** Fields shared by create and update; every one optional here, required ones enforced in CreatePartDto. */
class PartFieldsDto {
  @StringField({ optional: true, nullable: true, maxLength: 80, example: 'SMD 1.6 mm reflow' }) mounting?: string | null;
  @NumberField({ optional: true, min: 1, max: 1000, example: 50 }) nominalImpedanceOhms?: number;
  @NumberField({ optional: true, nullable: true, min: 0, max: 5000 }) lengthMm?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 5000 }) widthMm?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 5000 }) heightMm?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 5000, description: 'Evaluation ground plane length, mm' }) evalGroundLengthMm?: number | null;
  @NumberField({ optional: true, nullable: true, min: 0, max: 5000, description: 'Evaluation ground plane width, mm' }) evalGroundWidthMm?: number | null;
  @NumberField({ optional: true, nullable: true, min: -273, max: 500 }) tempMinC?: number | null;
  @NumberField({ optional: true, nullable: true, min: -273, max: 500 }) tempMaxC?: number | null;
  @EnumField(LIFECYCLES, { enumName: 'Lifecycle', optional: true }) lifecycle?: Lifecycle;
  @StringField({ optional: true, nullable: true, maxLength: 4000 }) notes?: string | null;

  @ApiPropertyOptional({ type: [SpecBandInputDto], description: 'Replaces all spec bands when given' })
  @OptionalField()
  @IsArray()
  @ArrayMaxSize(64)
  @ValidateNested({ each: true })
  @Type(() => SpecBandInputDto)
  specBands?: SpecBandInputDto[];
}

export class CreatePartDto extends PartFieldsDto {
  @StringField({ maxLength: 120, example: 'Korrel Antennas' }) manufacturer: string;
  @StringField({ maxLength: 80, example: 'KA-LTE-0921' }) mpn: string;
  @StringField({ maxLength: 200, example: 'Wideband LTE chip antenna 698–960 / 1710–2690 MHz' }) title: string;
  @EnumField(FORM_FACTORS, { enumName: 'FormFactor' }) formFactor: FormFactor;
  @EnumField(CONNECTORS, { enumName: 'Connector' }) connector: Connector;
  @EnumField(POLARIZATIONS, { enumName: 'PartPolarization' }) polarization: PartPolarization;
}

export class UpdatePartDto extends PartFieldsDto {
  @IntField({ min: 1, description: 'The version you edited (optimistic locking)' }) version: number;
  @StringField({ optional: true, maxLength: 120 }) manufacturer?: string;
  @StringField({ optional: true, maxLength: 80 }) mpn?: string;
  @StringField({ optional: true, maxLength: 200 }) title?: string;
  @EnumField(FORM_FACTORS, { enumName: 'FormFactor', optional: true }) formFactor?: FormFactor;
  @EnumField(CONNECTORS, { enumName: 'Connector', optional: true }) connector?: Connector;
  @EnumField(POLARIZATIONS, { enumName: 'PartPolarization', optional: true }) polarization?: PartPolarization;
}

export class ReviewActionDto {
  @IntField({ min: 1, description: 'The version you reviewed (optimistic locking)' }) version: number;
  @StringField({ optional: true, maxLength: 2000, description: 'Required for rejection and restriction' }) comment?: string;
}
