import { ApiProperty } from '@nestjs/swagger';
import { EFFICIENCY_BASES, type EfficiencyBasis, FIGURE_STATISTICS, type FigureStatistic, GAIN_BASES, type GainBasis } from '../part.types';
import { MISSING_ITEMS, type MissingItem } from '../review/part-consistency';

export class DirectivityCheckDto {
  @ApiProperty({ enum: ['measured', 'datasheet', 'mixed'], description: 'Where the gain and the efficiency came from' }) source:
    'measured' | 'datasheet' | 'mixed';
  @ApiProperty({ description: 'Highest implied directivity over the band, D = G / η on one basis (dBi)' }) maxDbi: number;
  @ApiProperty({ description: 'Lowest implied directivity over the band (dBi)' }) minDbi: number;
  @ApiProperty({ enum: ['below-dipole', 'above-form-factor', 'plausible'], enumName: 'DirectivityVerdict' }) verdict:
    'below-dipole' | 'above-form-factor' | 'plausible';
}

export class BandCheckDto {
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ type: Number, nullable: true }) claimedMaxVswr: number | null;
  @ApiProperty({ type: Number, nullable: true }) measuredWorstVswr: number | null;
  @ApiProperty({ type: Number, nullable: true }) measuredWorstVswrAtMhz: number | null;
  @ApiProperty({ type: Boolean, nullable: true, description: 'Null when there is nothing to compare' }) vswrAgrees: boolean | null;
  @ApiProperty({ type: Number, nullable: true }) claimedEfficiencyPct: number | null;
  @ApiProperty({ enum: EFFICIENCY_BASES, enumName: 'EfficiencyBasis' }) claimedEfficiencyBasis: EfficiencyBasis;
  @ApiProperty({ enum: FIGURE_STATISTICS, enumName: 'FigureStatistic' }) claimedEfficiencyStatistic: FigureStatistic;
  @ApiProperty({ type: Number, nullable: true, description: 'By the claim statistic (lowest or average over the band)' }) measuredEfficiencyPct: number | null;
  @ApiProperty({ enum: EFFICIENCY_BASES, enumName: 'EfficiencyBasis', nullable: true }) measuredEfficiencyBasis: EfficiencyBasis | null;
  @ApiProperty({ type: Boolean, nullable: true, description: 'Compared only on the same basis' }) efficiencyAgrees: boolean | null;
  @ApiProperty({ type: Number, nullable: true }) claimedPeakGainDbi: number | null;
  @ApiProperty({ enum: GAIN_BASES, enumName: 'GainBasis' }) claimedGainBasis: GainBasis;
  @ApiProperty({ type: Number, nullable: true }) measuredPeakGainDbi: number | null;
  @ApiProperty({ enum: GAIN_BASES, enumName: 'GainBasis', nullable: true }) measuredGainBasis: GainBasis | null;
  @ApiProperty({ type: Boolean, nullable: true }) peakGainAgrees: boolean | null;
  @ApiProperty({ type: DirectivityCheckDto, nullable: true }) directivity: DirectivityCheckDto | null;
}

export class PartConsistencyDto {
  @ApiProperty({ enum: MISSING_ITEMS, enumName: 'MissingItem', isArray: true }) missing: MissingItem[];
  @ApiProperty({ description: 'The highest directivity believable for the form factor (dBi, common practice)' }) plausibleMaxDirectivityDbi: number;
  @ApiProperty({ type: [BandCheckDto], description: 'One per datasheet band' }) bands: BandCheckDto[];
  @ApiProperty({ description: 'Bands where a figure disagrees with a measurement or the implied directivity is not credible' }) disagreements: number;
}
