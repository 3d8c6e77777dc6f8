import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { EnumField, IntField, NumberField } from '../../common/dto-fields';
import { TOUCHSTONE_MAX_PORTS } from '../../rf/touchstone';

export const MATCH_CRITERIA = ['vswr', 'return-loss-10db'] as const;
export type MatchCriterionName = (typeof MATCH_CRITERIA)[number];

/** The multipart form fields next to `file`. */
export class AnalyzeTouchstoneDto {
  @NumberField({ optional: true, min: 1.01, max: 100, description: 'VSWR limit for the matched ranges when criterion is "vswr"', example: 2 })
  vswrMax?: number;

  @IntField({ optional: true, min: 1, max: TOUCHSTONE_MAX_PORTS, description: 'Port whose reflection (S11, S22, …) is analysed', example: 1 })
  port?: number;

  @EnumField(MATCH_CRITERIA, {
    enumName: 'MatchCriterion',
    optional: true,
    description: '"vswr" uses vswrMax; "return-loss-10db" is |S11| ≤ −10 dB (VSWR ≈ 1.92)',
  })
  criterion?: MatchCriterionName;
}

/** Swagger's view of the whole multipart body. */
export class AnalyzeTouchstoneFormDto extends AnalyzeTouchstoneDto {
  @ApiProperty({ type: 'string', format: 'binary', description: 'A Touchstone file (.s1p … .s64p, or version 2 .ts), at most 32 MiB' })
  file: unknown;
}

export class FrequencyRangeDto {
  @ApiProperty() fromHz: number;
  @ApiProperty() toHz: number;
}

export class MatchPointDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty() gammaMagnitude: number;
  @ApiProperty() vswr: number;
  @ApiProperty() returnLossDb: number;
}

export class CurvePointDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ description: '|Γ|' }) gammaMagnitude: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null where |Γ| = 1 (infinite)' }) vswr: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive dB; null where |Γ| = 0 (infinite)' }) returnLossDb: number | null;
}

export class TouchstoneAnalysisDto {
  @ApiProperty({ example: '1.0' }) version: string;
  @ApiProperty({ description: 'Ports in the file, 1 to 64' }) ports: number;
  @ApiProperty({ description: 'Parameter as written in the file; the analysis always uses S', enum: ['S', 'Y', 'Z', 'H', 'G'] }) parameter: string;
  @ApiProperty({ enum: ['DB', 'MA', 'RI'] }) format: string;
  @ApiProperty({ type: [Number], description: 'Reference resistance per port, ohms' }) referenceOhms: number[];
  @ApiProperty({ description: 'Frequency points in the file' }) points: number;
  @ApiProperty() minFrequencyHz: number;
  @ApiProperty() maxFrequencyHz: number;
  @ApiProperty({ description: 'The port analysed' }) port: number;
  @ApiProperty({ enum: MATCH_CRITERIA, enumName: 'MatchCriterion' }) criterion: MatchCriterionName;
  @ApiProperty({ description: 'The criterion as a VSWR limit' }) thresholdVswr: number;
  @ApiProperty({ description: 'The criterion as a minimum return loss, dB' }) thresholdReturnLossDb: number;
  @ApiProperty({ type: [FrequencyRangeDto], description: 'Ranges meeting the criterion, computed on every file point with interpolated edges' })
  matchedRanges: FrequencyRangeDto[];
  @ApiProperty({
    description: 'How many ranges meet the criterion; matchedRanges holds the first 100 of them (a noisy file can cross the limit at every point)',
  })
  matchedRangeCount: number;
  @ApiProperty({ type: MatchPointDto, description: 'The file point with the lowest |Γ|' }) bestMatch: MatchPointDto;
  @ApiPropertyOptional({ description: 'True when the curve below is resampled (files with more points than curve holds)' }) resampled: boolean;
  @ApiProperty({
    type: [CurvePointDto],
    description: 'For plotting: the file points, or for longer files |Γ| resampled by linear interpolation to 2000 evenly spaced frequencies',
  })
  curve: CurvePointDto[];
}
