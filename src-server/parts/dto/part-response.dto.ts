import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { PartConsistencyDto } from './consistency.dto';
import {
  CONNECTORS,
  type Connector,
  DOCUMENT_KINDS,
  type DocumentKind,
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
  MEASUREMENT_BASES,
  type MeasurementBasis,
  MEASUREMENT_KINDS,
  type MeasurementKind,
  POLARIZATIONS,
  type PartPolarization,
  REVIEW_STATES,
  type ReviewState,
} from '../part.types';

export class UserRefDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

export class PriceDto {
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ example: '0.4200', description: 'Decimal string' }) unitPrice: string;
}

/** One row of the catalogue table. */
export class PartSummaryDto {
  @ApiProperty() id: number;
  @ApiProperty() manufacturer: string;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: FORM_FACTORS, enumName: 'FormFactor' }) formFactor: FormFactor;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector' }) connector: Connector;
  @ApiProperty({ enum: POLARIZATIONS, enumName: 'PartPolarization' }) polarization: PartPolarization;
  @ApiProperty({ enum: LIFECYCLES, enumName: 'Lifecycle' }) lifecycle: Lifecycle;
  @ApiProperty({ enum: REVIEW_STATES, enumName: 'ReviewState' }) reviewState: ReviewState;
  @ApiProperty({ enum: MEASUREMENT_KINDS, enumName: 'MeasurementKind', isArray: true }) measuredKinds: MeasurementKind[];
  @ApiProperty({ type: [PriceDto], description: 'Lowest unit price per currency over all offers' }) lowestPrices: PriceDto[];
  @ApiProperty() updatedAt: string;
}

export class PartListDto {
  @ApiProperty({ type: [PartSummaryDto] }) items: PartSummaryDto[];
  @ApiProperty() total: number;
}

export class SpecBandDto {
  @ApiProperty() id: number;
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ type: Number, nullable: true }) maxVswr: number | null;
  @ApiProperty({ type: Number, nullable: true }) minReturnLossDb: number | null;
  @ApiProperty({ type: Number, nullable: true }) efficiencyPct: number | null;
  @ApiProperty({ enum: EFFICIENCY_BASES, enumName: 'EfficiencyBasis', description: 'radiation: mismatch left out; total: mismatch included' })
  efficiencyBasis: EfficiencyBasis;
  @ApiProperty({ enum: FIGURE_STATISTICS, enumName: 'FigureStatistic', description: "efficiencyPct is the band's minimum or its average" })
  efficiencyStatistic: FigureStatistic;
  @ApiProperty({ type: Number, nullable: true }) peakGainDbi: number | null;
  @ApiProperty({ type: Number, nullable: true }) averageGainDbi: number | null;
  @ApiProperty({ enum: GAIN_BASES, enumName: 'GainBasis', description: "peak: the antenna's gain, mismatch left out; realized: mismatch included" })
  gainBasis: GainBasis;
}

export class MeasurementDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: MEASUREMENT_KINDS, enumName: 'MeasurementKind' }) kind: MeasurementKind;
  @ApiProperty({
    enum: MEASUREMENT_BASES,
    enumName: 'MeasurementBasis',
    nullable: true,
    description: 'efficiency: radiation or total; gains: peak or realized; null for s11',
  })
  basis: MeasurementBasis | null;
  @ApiProperty({ type: Number, nullable: true }) groundLengthMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) groundWidthMm: number | null;
  @ApiProperty({ type: String, nullable: true }) conditions: string | null;
  @ApiProperty() fileName: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty() sha256: string;
  @ApiProperty() sourceFormat: string;
  @ApiProperty({ type: Number, nullable: true }) referenceOhms: number | null;
  @ApiProperty() pointCount: number;
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ description: 'True for the newest measurement of its kind, the one search and checks use' }) current: boolean;
  @ApiProperty({ type: UserRefDto, nullable: true }) uploadedBy: UserRefDto | null;
  @ApiProperty() createdAt: string;
}

export class MeasurementPointsDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: MEASUREMENT_KINDS, enumName: 'MeasurementKind' }) kind: MeasurementKind;
  @ApiProperty({ type: [Number] }) frequenciesHz: number[];
  @ApiProperty({ type: [Number], description: 's11: |Γ|; efficiency: %; gains: dBi' }) values: number[];
  @ApiPropertyOptional({ type: [Number], description: 's11 only: VSWR' }) vswr?: number[];
  @ApiPropertyOptional({ type: [Number], description: 's11 only: return loss, dB (positive)' }) returnLossDb?: number[];
}

export class CoveredRangeDto {
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ enum: ['measured', 'spec'] }) source: 'measured' | 'spec';
}

/** Figures of one frequency range computed by the RF module from the current curves, or from spec bands. */
export class RangeFiguresDto {
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ enum: ['measured', 'spec', 'no-data'] }) matchSource: 'measured' | 'spec' | 'no-data';
  @ApiProperty({ type: Number, nullable: true, description: 'Share of the range with VSWR ≤ 2, 0..1' }) coveredFractionVswr2: number | null;
  @ApiProperty({ type: Number, nullable: true }) worstVswr: number | null;
  @ApiProperty({ type: Number, nullable: true }) worstVswrAtMhz: number | null;
  @ApiProperty({ type: Number, nullable: true }) minReturnLossDb: number | null;
  @ApiProperty({ enum: ['measured', 'spec', 'no-data'] }) efficiencySource: 'measured' | 'spec' | 'no-data';
  @ApiProperty({
    enum: ['radiation', 'total', 'mixed'],
    nullable: true,
    description: 'What the efficiency figures include, as the data states it (radiation: mismatch left out; total: included); null without figures',
  })
  efficiencyBasis: EfficiencyBasis | 'mixed' | null;
  @ApiProperty({ type: Number, nullable: true }) minEfficiencyPct: number | null;
  @ApiProperty({ type: Number, nullable: true }) averageEfficiencyPct: number | null;
  @ApiProperty({ type: Number, nullable: true }) averageEfficiencyDb: number | null;
  @ApiProperty({ type: Number, nullable: true }) peakGainDbi: number | null;
  @ApiProperty({ type: Number, nullable: true }) averageGainDbi: number | null;
  @ApiProperty({ type: [String], description: 'Why a figure is missing' }) notes: string[];
}

export class DocumentDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: DOCUMENT_KINDS, enumName: 'DocumentKind' }) kind: DocumentKind;
  @ApiProperty() title: string;
  @ApiProperty() fileName: string;
  @ApiProperty() contentType: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty() sha256: string;
  @ApiProperty({ type: UserRefDto, nullable: true }) uploadedBy: UserRefDto | null;
  @ApiProperty() createdAt: string;
}

export class PriceBreakDto {
  @ApiProperty() quantity: number;
  @ApiProperty({ example: '0.4200' }) unitPrice: string;
}

export class OfferDto {
  @ApiProperty() id: number;
  @ApiProperty() supplier: string;
  @ApiProperty({ type: String, nullable: true }) sku: string | null;
  @ApiProperty() currency: string;
  @ApiProperty({ type: [PriceBreakDto] }) priceBreaks: PriceBreakDto[];
  @ApiProperty({ type: Number, nullable: true }) moq: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Pieces in stock when last checked' }) stock: number | null;
  @ApiProperty({ type: Number, nullable: true }) leadTimeDays: number | null;
  @ApiProperty({ type: String, nullable: true, example: '2025-11-20' }) lastCheckedOn: string | null;
  @ApiProperty() version: number;
}

export class OfferRemovalDto {
  @ApiProperty() offerId: number;
  @ApiProperty() supplier: string;
  @ApiProperty() removedAt: string;
  @ApiProperty({ description: 'Until when the removal can be undone (ISO 8601)' }) undoUntil: string;
}

export class AlternateDto {
  @ApiProperty() partId: number;
  @ApiProperty() manufacturer: string;
  @ApiProperty() mpn: string;
  @ApiProperty({ enum: REVIEW_STATES, enumName: 'ReviewState' }) reviewState: ReviewState;
  @ApiProperty({ enum: ['alternate', 'second-source'] }) kind: string;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
}

export class PartPermissionsDto {
  @ApiProperty() edit: boolean;
  @ApiProperty() uploadData: boolean;
  @ApiProperty() submit: boolean;
  @ApiProperty() review: boolean;
  @ApiProperty() editSourcing: boolean;
}

export class PartDetailDto {
  @ApiProperty() id: number;
  @ApiProperty() manufacturer: string;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: FORM_FACTORS, enumName: 'FormFactor' }) formFactor: FormFactor;
  @ApiProperty({ type: String, nullable: true }) mounting: string | null;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector' }) connector: Connector;
  @ApiProperty({ enum: POLARIZATIONS, enumName: 'PartPolarization' }) polarization: PartPolarization;
  @ApiProperty() nominalImpedanceOhms: number;
  @ApiProperty({ type: Number, nullable: true }) lengthMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) widthMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) heightMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) evalGroundLengthMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) evalGroundWidthMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) tempMinC: number | null;
  @ApiProperty({ type: Number, nullable: true }) tempMaxC: number | null;
  @ApiProperty({ enum: LIFECYCLES, enumName: 'Lifecycle' }) lifecycle: Lifecycle;
  @ApiProperty({ enum: REVIEW_STATES, enumName: 'ReviewState' }) reviewState: ReviewState;
  @ApiProperty({ type: String, nullable: true }) reviewComment: string | null;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty() version: number;
  @ApiProperty({ type: UserRefDto, nullable: true }) createdBy: UserRefDto | null;
  @ApiProperty({ type: UserRefDto, nullable: true }) submittedBy: UserRefDto | null;
  @ApiProperty({ type: String, nullable: true }) submittedAt: string | null;
  @ApiProperty({ type: UserRefDto, nullable: true }) reviewedBy: UserRefDto | null;
  @ApiProperty({ type: String, nullable: true }) reviewedAt: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
  @ApiProperty({ type: [SpecBandDto] }) specBands: SpecBandDto[];
  @ApiProperty({ type: [MeasurementDto] }) measurements: MeasurementDto[];
  @ApiProperty({ type: [RangeFiguresDto], description: 'Per range: the spec bands, plus any ?ranges= asked for' }) figures: RangeFiguresDto[];
  @ApiProperty({ type: [CoveredRangeDto], description: 'Where VSWR ≤ 2: from the current S11, else from spec bands claiming it' })
  coveredRanges: CoveredRangeDto[];
  @ApiProperty({ type: [DocumentDto] }) documents: DocumentDto[];
  @ApiProperty({ type: [OfferDto] }) offers: OfferDto[];
  @ApiProperty({ type: [AlternateDto] }) alternates: AlternateDto[];
  @ApiProperty({ description: 'What the caller may do with this part' }) permissions: PartPermissionsDto;
}

export class ReviewQueueItemDto {
  @ApiProperty() id: number;
  @ApiProperty() manufacturer: string;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() version: number;
  @ApiProperty({ type: UserRefDto, nullable: true }) submittedBy: UserRefDto | null;
  @ApiProperty({ type: String, nullable: true }) submittedAt: string | null;
  @ApiProperty({ enum: MEASUREMENT_KINDS, enumName: 'MeasurementKind', isArray: true }) measuredKinds: MeasurementKind[];
  @ApiProperty() documentCount: number;
  @ApiProperty({ type: PartConsistencyDto, description: 'Datasheet claims against measurements, what is missing, implied directivity' })
  check: PartConsistencyDto;
}
