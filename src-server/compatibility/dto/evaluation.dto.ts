import { ANTENNA_ROLES, type AntennaRole } from '../../products/in-product/antenna-roles';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';
import { IntField } from '../../common/dto-fields';
import { TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { CONNECTORS, type Connector } from '../../parts/part.types';
import { CELL_STATUSES, type CellStatus, FindingDto, OfferPriceDto } from './matrix.dto';

const VERDICT_DOC =
  'pass | marginal | fail | no-data. A product or radio takes its worst part: fail, then no-data (what was not checked cannot pass), then marginal, then pass.';

export class EvaluationFindingDto extends FindingDto {
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'The radio the finding is about; null for the product as a whole' }) radioId: number | null;
}

export class BandFactsDto {
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Share (0–1) of the band width where VSWR ≤ coverageVswr' }) coverageFraction:
    number | null;
  @ApiProperty({ description: 'The VSWR the coverage is judged at (the band-coverage rule: 3:1)' }) coverageVswr: number;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Highest VSWR in the band, VSWR = (1 + |Γ|) / (1 − |Γ|)' }) worstVswr: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Lowest total efficiency (mismatch included), %' }) minTotalEfficiencyPct: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Total efficiency averaged over the band (linear power), %' }) avgTotalEfficiencyPct:
    number | null;
  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: "Lowest efficiency at the radio port: total efficiency × 10^(−feed loss / 10), with the radio's feed loss, %",
  })
  minSystemEfficiencyPct: number | null;
  @ApiProperty({ description: "The radio's feed or cable loss, dB" }) feedLossDb: number;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Highest peak gain in the band, dBi' }) peakGainDbi: number | null;
  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: 'EIRP = transmit power + peak gain on the transmit ranges − feed loss, dBm; null for a receive-only radio',
  })
  eirpDbm: number | null;
  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: 'Largest downward shift of the measured S11 curve that keeps the whole band at VSWR ≤ 3:1, %; null without a measured S11 that meets it',
  })
  detuningMarginDownPct: number | null;
  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    description: 'Largest upward shift of the measured S11 curve that keeps the whole band at VSWR ≤ 3:1, %',
  })
  detuningMarginUpPct: number | null;
}

export class EvaluationBandDto {
  @ApiProperty() bandId: number;
  @ApiProperty() designation: string;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus', description: VERDICT_DOC }) verdict: CellStatus;
  @ApiPropertyOptional({ type: FindingDto, nullable: true, description: 'The finding that decides the verdict; null for a pass' })
  decidingFinding: FindingDto | null;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'The chosen part the band was judged with; null when none is chosen' }) partId:
    number | null;
  @ApiProperty({ type: [FindingDto], description: 'Every finding of the band, notes included' }) findings: FindingDto[];
  @ApiProperty({ type: BandFactsDto }) facts: BandFactsDto;
}

export class ChosenPartDto {
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() manufacturer: string;
  @ApiProperty({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', description: 'The antenna of the radio this part is (main unless the radio has several)' })
  role: AntennaRole;
  @ApiProperty({ description: 'Which S11 the bands were judged with: "evaluation board" or "measured in product, file X, port N"' }) s11Source: string;
}

export class EvaluationRadioDto {
  @ApiProperty() radioId: number;
  @ApiProperty() name: string;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology' }) technology: Technology;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus', description: VERDICT_DOC }) verdict: CellStatus;
  @ApiPropertyOptional({ type: FindingDto, nullable: true, description: 'The finding that decides the radio; null for a pass' })
  decidingFinding: FindingDto | null;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'The band of the deciding finding' }) decidingBandId: number | null;
  @ApiProperty({ example: 'Efficiency below floor on BLE 2.4 GHz: total efficiency falls to 21 % at 2400 MHz; the floor for ble is 30 %' })
  reason: string;
  @ApiProperty({ type: [ChosenPartDto] }) chosen: ChosenPartDto[];
  @ApiProperty({ type: [EvaluationBandDto] }) bands: EvaluationBandDto[];
}

export const COEXISTENCE_MECHANISMS = ['harmonic', 'intermodulation', 'adjacent'] as const;
export const FINDING_SEVERITIES = ['fail', 'marginal', 'info'] as const;

export class CoexistenceEndDto {
  @ApiProperty() radioId: number;
  @ApiProperty() bandId: number;
  @ApiProperty({ example: 'B13' }) designation: string;
}

export class CoexistenceFindingDto {
  @ApiProperty({ type: CoexistenceEndDto, description: 'The transmitter (for intermodulation, the stronger of the two)' }) aggressor: CoexistenceEndDto;
  @ApiPropertyOptional({ type: CoexistenceEndDto, nullable: true, description: 'The other transmitter of an intermodulation product; null otherwise' })
  secondAggressor: CoexistenceEndDto | null;
  @ApiProperty({ type: CoexistenceEndDto, description: 'The receiver the product lands on or near' }) victim: CoexistenceEndDto;
  @ApiProperty({ enum: COEXISTENCE_MECHANISMS, enumName: 'CoexistenceMechanism' }) mechanism: (typeof COEXISTENCE_MECHANISMS)[number];
  @ApiProperty({ description: 'Harmonic number (2–5), intermodulation order (3 or 5), or 1 for a transmit band next to a receive band' }) order: number;
  @ApiProperty({ example: '2 × B13', description: 'How the product is formed, in band designations' }) expression: string;
  @ApiProperty({ description: 'Lowest frequency of the product, MHz' }) fromMhz: number;
  @ApiProperty({ description: 'Highest frequency of the product, MHz' }) toMhz: number;
  @ApiProperty({ description: "Lowest frequency of the victim's receive range, MHz" }) victimFromMhz: number;
  @ApiProperty({ description: "Highest frequency of the victim's receive range, MHz" }) victimToMhz: number;
  @ApiProperty({ description: 'Width of the product inside the receive range, MHz (0 when it only comes within the guard)' }) overlapMhz: number;
  @ApiProperty({ description: 'Gap between the product and the receive range, MHz (0 when they overlap)' }) distanceMhz: number;
  @ApiProperty({ enum: FINDING_SEVERITIES, enumName: 'Severity' }) severity: (typeof FINDING_SEVERITIES)[number];
  @ApiProperty() message: string;
  @ApiProperty({ description: "The aggressor radio's transmit power, dBm" }) aggressorPowerDbm: number;
  @ApiProperty({ description: 'Assumed emission level of the mechanism and order relative to the carrier, dBc (rule parameter)' }) emissionDbc: number;
  @ApiProperty({ description: 'Interference the victim tolerates: −174 dBm/Hz + 10·log10(bandwidth) + noise figure + I/N, dBm (rule parameters)' })
  victimTolerableDbm: number;
  @ApiProperty({ description: 'Antenna isolation needed: transmit power + emission level − tolerable level, dB' }) requiredIsolationDb: number;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'In-product antenna isolation between the two radios, dB; null when unknown' })
  isolationDb: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'isolationDb − requiredIsolationDb, dB; null when the isolation is unknown' })
  isolationMarginDb: number | null;
}

export class ProductEvaluationDto {
  @ApiProperty() productId: number;
  @ApiProperty() productName: string;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus', description: VERDICT_DOC }) verdict: CellStatus;
  @ApiProperty({ description: "The deciding radio's reason in words" }) reason: string;
  @ApiProperty({ type: [EvaluationRadioDto] }) radios: EvaluationRadioDto[];
  @ApiProperty({
    type: [EvaluationFindingDto],
    description: 'Findings about the product and its radios as a whole (no part chosen …); band findings are on the bands',
  })
  findings: EvaluationFindingDto[];
  @ApiProperty({
    type: [CoexistenceFindingDto],
    description:
      "Harmonics, intermodulation and transmit edges of one radio on or near another radio's receive ranges (rules/coexistence/coexistence.json); counted into the product verdict by severity",
  })
  coexistence: CoexistenceFindingDto[];
  @ApiProperty({ description: 'Rule ids and versions the evaluation used' }) rules: string;
  @ApiProperty({ description: 'When the evaluation was computed (ISO 8601)' }) evaluatedAt: string;
}

export class BillOfMaterialsQueryDto {
  @IntField({
    optional: true,
    min: 1,
    max: 100_000_000,
    description: 'Products to build; price breaks are taken at this times the parts per product (default 1)',
  })
  quantity?: number;

  @ApiPropertyOptional({ example: 'USD', description: 'Currency preferred when a part has offers in several (default USD)' })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'must be a three-letter currency code such as USD' })
  currency?: string;
}

export class BomRadioRefDto {
  @ApiProperty() radioId: number;
  @ApiProperty() name: string;
}

export class BomLineDto {
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() manufacturer: string;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector' }) connector: Connector;
  @ApiProperty({ type: [BomRadioRefDto], description: 'The radios the part is chosen for' }) radios: BomRadioRefDto[];
  @ApiProperty({ description: 'Pieces per product (one per radio it is chosen for)' }) quantityPerUnit: number;
  @ApiProperty({ description: 'Pieces bought for the build: quantity × quantityPerUnit' }) buyQuantity: number;
  @ApiPropertyOptional({ type: OfferPriceDto, nullable: true, description: 'The offer bought from; null when no offer can supply buyQuantity' })
  offer: OfferPriceDto | null;
  @ApiPropertyOptional({ type: String, nullable: true, example: '0.8422', description: 'unit price × quantityPerUnit, in the offer currency' })
  costPerUnit: string | null;
}

export class CurrencyTotalDto {
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ example: '1.2633', description: 'Decimal string' }) total: string;
}

export class BillOfMaterialsDto {
  @ApiProperty() productId: number;
  @ApiProperty() productName: string;
  @ApiProperty() quantity: number;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ type: [BomLineDto] }) lines: BomLineDto[];
  @ApiProperty({ type: [BomRadioRefDto], description: 'Radios with no chosen part: the cost leaves them out' }) radiosWithoutPart: BomRadioRefDto[];
  @ApiProperty({ type: [CurrencyTotalDto], description: 'Antenna cost per product, one total per currency when the offers mix them' })
  totalPerUnit: CurrencyTotalDto[];
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Longest lead time of the offers bought from, days' }) longestLeadTimeDays: number | null;
  @ApiProperty({ description: 'Every radio has a chosen part and every part an offer at the quantity' }) complete: boolean;
}
