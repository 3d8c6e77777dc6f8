import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';
import { IntField, StringField } from '../../common/dto-fields';

export const CELL_STATUSES = ['pass', 'marginal', 'fail', 'no-data'] as const;
export type CellStatus = (typeof CELL_STATUSES)[number];

export class MatrixQueryDto {
  @ApiPropertyOptional({ description: 'Comma-separated part ids; default: the parts assigned to or shortlisted for the product', example: '3,17,42' })
  @IsOptional()
  @Matches(/^\d{1,10}(,\d{1,10}){0,99}$/, { message: 'must be up to 100 comma-separated part ids, e.g. 3,17,42' })
  parts?: string;
}

export class CandidatesQueryDto {
  @IntField({ optional: true, min: 1, max: 200, description: 'How many of the best candidates to return (default 20)' })
  limit?: number;
}

export class FindingDto {
  @ApiProperty() ruleId: string;
  @ApiProperty({ enum: ['fail', 'marginal', 'info', 'no-data'] }) severity: string;
  @ApiProperty({ example: 'EFFICIENCY_BELOW_FLOOR' }) code: string;
  @ApiProperty({ example: 'total efficiency falls to 31 % at 699 MHz; the floor for lte is 40 %' }) message: string;
}

export class MatrixRangeDto {
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty() role: string;
}

export class MatrixRowDto {
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty() technology: string;
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
  @ApiProperty() reviewState: string;
  @ApiProperty() lifecycle: string;
  @ApiProperty({ type: [ColumnAssignmentDto] }) assignments: ColumnAssignmentDto[];
}

export class MatrixCellDto {
  @ApiProperty({ description: 'Index into rows' }) row: number;
  @ApiProperty({ description: 'Index into columns' }) column: number;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiProperty({ type: [FindingDto] }) findings: FindingDto[];
}

export class MatrixDto {
  @ApiProperty() productId: number;
  @ApiProperty() productName: string;
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
}

export class CandidateDto {
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty() title: string;
  @ApiProperty() manufacturer: string;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) status: CellStatus;
  @ApiPropertyOptional({ type: Number, nullable: true }) marginDb: number | null;
  @ApiPropertyOptional({ type: DecidingFigureDto, nullable: true }) deciding: DecidingFigureDto | null;
  @ApiPropertyOptional({ type: String, enum: ['shortlisted', 'chosen'], nullable: true }) assignment: string | null;
  @ApiProperty({ type: [CandidateBandDto] }) bands: CandidateBandDto[];
}

export class CandidatesDto {
  @ApiProperty() productId: number;
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty({ description: 'Approved parts evaluated' }) evaluated: number;
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
  @ApiPropertyOptional({ type: String, nullable: true }) note: string | null;
  @ApiProperty() updatedAt: string;
}

export class ShortlistDto {
  @IntField({ min: 1, description: 'The part to shortlist for this radio' }) partId: number;
  @StringField({ optional: true, maxLength: 500 }) note?: string;
}

export class ChoosePartDto {
  @IntField({ min: 1, description: 'The part to choose for this radio; it joins the shortlist if it was not on it' }) partId: number;
}
