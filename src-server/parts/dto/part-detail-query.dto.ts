import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';
import { IntField } from '../../common/dto-fields';

export class PartDetailQueryDto {
  @ApiPropertyOptional({ example: '791-862,880-960', description: 'Extra ranges in MHz to compute figures for, beside the spec bands' })
  @IsOptional()
  @Matches(/^\s*\d+(\.\d+)?\s*-\s*\d+(\.\d+)?\s*(,\s*\d+(\.\d+)?\s*-\s*\d+(\.\d+)?\s*){0,31}$/, {
    message: 'must be ranges in MHz like 791-862,880-960 (at most 32)',
  })
  ranges?: string;
}

export class HistoryQueryDto {
  @IntField({ optional: true, min: 1, max: 500 }) limit?: number;
  @IntField({ optional: true, min: 0 }) offset?: number;
}
