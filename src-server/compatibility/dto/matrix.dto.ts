import { ANTENNA_ROLES, type AntennaRole } from '../../products/in-product/antenna-roles';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';
import { ListField } from '../../parts/dto/part-search.dto';
import { CONNECTORS, type Connector, FORM_FACTORS, type FormFactor, LIFECYCLES, type Lifecycle, REVIEW_STATES, type ReviewState } from '../../parts/part.types';
import { RANGE_ROLES, type RangeRole, TECHNOLOGIES, type Technology } from '../../bands/band-domain';
import { BoolField, EnumField, IntField, StringField } from '../../common/dto-fields';

export const CELL_STATUSES = ['pass', 'marginal', 'fail', 'no-data'] as const;
export type CellStatus = (typeof CELL_STATUSES)[number];

export class MatrixQueryDto {
  @ApiPropertyOptional({ description: 'Comma-separated part ids; default: the parts assigned to or shortlisted for the product', example: '3,17,42' })
  @IsOptional()
  @Matches(/^\d{1,10}(,\d{1,10}){0,99}$/, { message: 'must be up to 100 comma-separated part ids, e.g. 3,17,42' })
  parts?: string;

  @BoolField({ optional: true, description: "Only each radio's chosen part (default: its chosen and shortlisted parts); not with `parts`" })
  chosenOnly?: boolean;
}

export const MATRIX_VIEWS = ['assigned', 'chosen', 'parts'] as const;
export type MatrixView = (typeof MATRIX_VIEWS)[number];

export class CandidatesQueryDto {
  @IntField({ optional: true, min: 1, max: 200, description: 'How many of the best candidates to return (default 20)' })
  limit?: number;

  @ListField(FORM_FACTORS, 'Only these form factors') formFactor?: FormFactor[];
  @ListField(CONNECTORS, 'Only parts with one of these feeds (connectors)') feed?: Connector[];

  @ApiPropertyOptional({ example: '1.50', description: 'Highest unit price at `quantity`, in `currency` (parts without such an offer are left out)' })
  @IsOptional()
  @Matches(/^\d{1,10}(\.\d{1,4})?$/, { message: 'must be a decimal amount such as 1.50 (up to 4 decimals)' })
  maxPrice?: string;

  @IntField({ optional: true, min: 0, max: 3650, description: 'Longest acceptable lead time in days (an offer must meet it, and maxPrice, together)' })
  maxLeadTimeDays?: number;

  @IntField({ optional: true, min: 1, max: 100_000_000, description: 'Build quantity the price is taken at, from the price breaks (default 1)' })
  quantity?: number;

  @ApiPropertyOptional({ example: 'USD', description: 'Currency of maxPrice, and the one preferred for the price shown (default USD)' })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'must be a three-letter currency code such as USD' })
  currency?: string;
}

export class FindingDto {
  @ApiProperty() ruleId: string;
  @ApiProperty({ enum: ['fail', 'marginal', 'info', 'no-data'] }) severity: string;
  @ApiProperty({ example: 'EFFICIENCY_BELOW_FLOOR', description: 'Stable code, kept for export and filtering' }) code: string;
  @ApiProperty({ example: 'Efficiency below floor', description: 'Short human title of the code, for screens' }) title: string;
  @ApiProperty({ example: 'total efficiency falls to 31 % at 699 MHz; the floor for lte is 40 %' }) message: string;
}

export class MatrixRangeDto {
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ enum: RANGE_ROLES, enumName: 'RangeRole' }) role: RangeRole;
}

export class MatrixRowDto {
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology' }) technology: Technology;
  @ApiProperty() bandId: number;
  @ApiProperty() designation: string;
  @ApiProperty({ type: [MatrixRangeDto] }) ranges: MatrixRangeDto[];
  @ApiProperty({
    type: [FindingDto],
    description: "Findings of the radio band itself, whatever the part: BAND_OUTSIDE_MARKETS (info) when none of the product's markets uses the band",
  })
  findings: FindingDto[];
}

export class RadioFindingsDto {
  @ApiProperty() radioId: number;
  @ApiProperty({
    type: [FindingDto],
    description: "Findings of the radio as a whole: MARKET_WITHOUT_BANDS (marginal) for each product market none of the radio's bands is used in",
  })
  findings: FindingDto[];
}

export class ColumnAssignmentDto {
  @ApiProperty() radioId: number;
  @ApiProperty({ enum: ['shortlisted', 'chosen'] }) state: string;
}

export class MatrixColumnDto {
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() manufacturer: string;
  @ApiProperty({ enum: REVIEW_STATES, enumName: 'ReviewState' }) reviewState: ReviewState;
  @ApiProperty({ enum: LIFECYCLES, enumName: 'Lifecycle' }) lifecycle: Lifecycle;
  @ApiProperty({ type: [ColumnAssignmentDto] }) assignments: ColumnAssignmentDto[];
}

export class MatrixCellDto {
  @ApiProperty({ description: 'Index into rows' }) row: number;
  @ApiProperty({ description: 'Index into columns' }) column: number;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiProperty({ type: [FindingDto] }) findings: FindingDto[];
  @ApiPropertyOptional({ type: FindingDto, nullable: true, description: 'The finding that decides the status; null for a pass' })
  decidingFinding: FindingDto | null;
}

export class MatrixDto {
  @ApiProperty() productId: number;
  @ApiProperty() productName: string;
  @ApiProperty({
    enum: MATRIX_VIEWS,
    enumName: 'MatrixView',
    description:
      "assigned: each radio's rows against that radio's chosen and shortlisted parts only; chosen: its chosen part only; parts: every row against the asked parts. Cells exist only for the pairs evaluated.",
  })
  view: MatrixView;
  @ApiProperty({ type: [MatrixRowDto] }) rows: MatrixRowDto[];
  @ApiProperty({ type: [MatrixColumnDto] }) columns: MatrixColumnDto[];
  @ApiProperty({ type: [MatrixCellDto] }) cells: MatrixCellDto[];
  @ApiProperty({ type: [RadioFindingsDto], description: 'Per radio of the product, findings about the radio as a whole (bands against markets)' })
  radios: RadioFindingsDto[];
  @ApiProperty({ description: 'Rule ids and versions the matrix was evaluated with' }) rules: string;
}

export class DecidingFigureDto {
  @ApiProperty() ruleId: string;
  @ApiProperty() ruleTitle: string;
  @ApiProperty() designation: string;
  @ApiProperty() fact: string;
  @ApiProperty() value: number;
  @ApiProperty() threshold: number;
  @ApiProperty({ description: 'dB inside the limit; negative means beyond it' }) marginDb: number;
  @ApiProperty() text: string;
}

export class CandidateBandDto {
  @ApiProperty() bandId: number;
  @ApiProperty() designation: string;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiProperty({ type: [FindingDto] }) findings: FindingDto[];
  @ApiPropertyOptional({ type: FindingDto, nullable: true, description: 'The finding that decides the band; null for a pass' })
  decidingFinding: FindingDto | null;
}

export class CandidateExplanationDto {
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiProperty({ example: 'Band not covered', description: "The deciding finding's short title; for a pass 'Nearest limit' or 'Passes'" }) title: string;
  @ApiProperty({ example: 'B3: VSWR ≤ 3:1 covers only 0 % of B3; not covered: 1710–1880 MHz' }) text: string;
  @ApiPropertyOptional({ type: FindingDto, nullable: true, description: 'The finding that decides the rank; null for a pass' }) finding: FindingDto | null;
  @ApiPropertyOptional({ type: Number, nullable: true }) bandId: number | null;
  @ApiPropertyOptional({ type: String, nullable: true }) designation: string | null;
}

export const FEED_FITS = ['direct', 'adapter', 'board-change'] as const;
export const POLARIZATION_FITS = ['matched', 'loss', 'opposite', 'unknown'] as const;

export class CandidateFitDto {
  @ApiProperty({
    enum: FEED_FITS,
    enumName: 'FeedFit',
    description: "direct: the radio's own feed; adapter: coaxial adapter or cable; board-change: solder pad against a connector",
  })
  feed: (typeof FEED_FITS)[number];
  @ApiProperty({
    enum: POLARIZATION_FITS,
    enumName: 'PolarizationFit',
    description: 'matched; loss: linear against circular (about 3 dB); opposite: the other circular sense',
  })
  polarization: (typeof POLARIZATION_FITS)[number];
  @ApiProperty({ description: 'Ranking weight of the two (0 = fits; each step away adds 1)' }) rank: number;
}

export class OfferPriceDto {
  @ApiProperty() offerId: number;
  @ApiProperty() supplier: string;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ example: '0.4211', description: 'Unit price at the asked quantity, decimal string' }) unitPrice: string;
  @ApiProperty({ description: 'Quantity of the price break that applies' }) breakQuantity: number;
  @ApiPropertyOptional({ type: Number, nullable: true }) leadTimeDays: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true }) moq: number | null;
}

export class CandidateDto {
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() manufacturer: string;
  @ApiProperty({ enum: FORM_FACTORS, enumName: 'FormFactor' }) formFactor: FormFactor;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector' }) connector: Connector;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiProperty({ type: CandidateFitDto }) fit: CandidateFitDto;
  @ApiProperty({ type: CandidateExplanationDto, description: 'Why the candidate stands here: the deciding finding, or for a pass its nearest limit' })
  explanation: CandidateExplanationDto;
  @ApiPropertyOptional({ type: Number, nullable: true }) marginDb: number | null;
  @ApiPropertyOptional({
    type: DecidingFigureDto,
    nullable: true,
    description: 'The limit the part is nearest to (or furthest over), which orders parts of one status',
  })
  deciding: DecidingFigureDto | null;
  @ApiPropertyOptional({
    type: OfferPriceDto,
    nullable: true,
    description: 'The offer it would be bought from at the asked quantity; null when none can supply it',
  })
  price: OfferPriceDto | null;
  @ApiPropertyOptional({ type: String, enum: ['shortlisted', 'chosen'], nullable: true }) assignment: string | null;
  @ApiProperty({ type: [CandidateBandDto] }) bands: CandidateBandDto[];
}

export class CandidatesDto {
  @ApiProperty() productId: number;
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty({ enum: CONNECTORS, enumName: 'Connector', description: "The radio's feed the candidates are fitted to" }) radioConnector: Connector;
  @ApiProperty({ description: 'Build quantity of the prices' }) quantity: number;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ description: 'Approved parts evaluated (after the filters)' }) evaluated: number;
  @ApiProperty({ type: [CandidateDto] }) candidates: CandidateDto[];
}

export class AssignmentDto {
  @ApiProperty() id: number;
  @ApiProperty() productId: number;
  @ApiProperty() radioId: number;
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: ['shortlisted', 'chosen'] }) state: string;
  @ApiProperty({ enum: ANTENNA_ROLES, enumName: 'AntennaRole', description: 'The antenna the part is chosen for (main for shortlisted parts)' })
  role: AntennaRole;
  @ApiPropertyOptional({ type: String, nullable: true }) note: string | null;
  @ApiProperty() updatedAt: string;
}

export class ShortlistDto {
  @IntField({ min: 1, description: 'The part to shortlist for this radio' }) partId: number;
  @StringField({ optional: true, maxLength: 500 }) note?: string;
}

export class ChoosePartDto {
  @IntField({ min: 1, description: 'The part to choose for this radio; it joins the shortlist if it was not on it' }) partId: number;
  @EnumField(ANTENNA_ROLES, { optional: true, enumName: 'AntennaRole', description: "Which of the radio's antennas (its antennaRoles); default main" })
  role?: AntennaRole;
}
