import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsObject } from 'class-validator';
import { BoolField, IntField } from '../../common/dto-fields';
import { SEVERITIES, type Severity } from '../engine/types';
import { CELL_STATUSES, type CellStatus } from './matrix.dto';

export type RuleOrigin = 'file' | 'file-edited' | 'admin';

export class RuleSummaryDto {
  @ApiProperty({ example: 'vswr-in-band' }) id: string;
  @ApiProperty() title: string;
  @ApiProperty() description: string;
  @ApiProperty({ enum: SEVERITIES, enumName: 'Severity' }) severity: Severity;
  @ApiProperty() enabled: boolean;
  @ApiProperty() version: number;
  @ApiProperty() source: string;
  @ApiProperty({
    enum: ['file', 'file-edited', 'admin'],
    description: 'file: as in rules/; file-edited: a file rule an admin changed; admin: made by an admin',
  })
  origin: RuleOrigin;
  @ApiPropertyOptional({ type: String, nullable: true }) updatedAt: string | null;
}

export class RuleDetailDto extends RuleSummaryDto {
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'The whole rule as JSON: parameters, appliesWhen, conditions (json-rules-engine) and event',
  })
  definition: Record<string, unknown>;
}

export class RuleProblemDto {
  @ApiProperty({ example: 'conditions.all[0].fact' }) path: string;
  @ApiProperty({ example: 'unknown fact "efficiencyPercentage"' }) message: string;
}

export class RuleValidationDto {
  @ApiProperty() valid: boolean;
  @ApiProperty({ type: [RuleProblemDto] }) problems: RuleProblemDto[];
}

/** The rule JSON travels as one document; its shape is checked by validateRuleDefinition, which names every problem. */
export class RuleDefinitionBodyDto {
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The rule as JSON (see rules/*.json)' })
  @IsObject()
  definition: Record<string, unknown>;
}

export class UpdateRuleDto extends RuleDefinitionBodyDto {
  @IntField({ min: 1, description: 'The version you edited; a stale one gets 409 RULE_VERSION_CONFLICT' })
  version: number;
}

export class SetRuleEnabledDto {
  @BoolField() enabled: boolean;
  @IntField({ min: 1, description: 'The version you saw' }) version: number;
}

export class RuleVersionDto {
  @ApiProperty() version: number;
  @ApiProperty({ enum: ['file', 'created', 'edited', 'enabled', 'disabled'] }) action: string;
  @ApiPropertyOptional({ type: String, nullable: true }) changedBy: string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) at: string | null;
  @ApiProperty({ type: 'object', additionalProperties: true }) definition: Record<string, unknown>;
}

export class PreviewRuleDto {
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'The rule as it would be saved (new or edited); its id decides which rule it replaces',
  })
  @IsObject()
  definition: Record<string, unknown>;
}

export class CellChangeDto {
  @ApiProperty() productId: number;
  @ApiProperty() productName: string;
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty() bandId: number;
  @ApiProperty() designation: string;
  @ApiProperty() partId: number;
  @ApiProperty() mpn: string;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) before: CellStatus;
  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' }) after: CellStatus;
  @ApiProperty({ type: [String], description: 'Messages of the previewed rule on this cell after the change' }) findings: string[];
}

export class RulePreviewDto {
  @ApiProperty() ruleId: string;
  @ApiProperty() cellsCompared: number;
  @ApiProperty() productsCompared: number;
  @ApiProperty({ type: [CellChangeDto] }) changes: CellChangeDto[];
}
