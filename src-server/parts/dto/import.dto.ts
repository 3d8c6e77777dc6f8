import { ApiProperty } from '@nestjs/swagger';
import { BoolField } from '../../common/dto-fields';

export class ImportQueryDto {
  @BoolField({ optional: true, description: 'List every problem by row and write nothing (default true)' }) dryRun?: boolean;
}

export class ImportProblemDto {
  @ApiProperty({ description: 'Data row, 1-based; 0 for the header' }) row: number;
  @ApiProperty({ description: 'Line in the file, 1-based' }) line: number;
  @ApiProperty() field: string;
  @ApiProperty() message: string;
}

export class ImportResultDto {
  @ApiProperty() dryRun: boolean;
  @ApiProperty() rowCount: number;
  @ApiProperty() validRows: number;
  @ApiProperty({ type: [ImportProblemDto] }) problems: ImportProblemDto[];
  @ApiProperty({ type: [Number] }) createdIds: number[];
}
