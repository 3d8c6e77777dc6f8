import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsDefined, IsPositive, ValidateNested } from 'class-validator';
import { EnumField, IntField, NumberField, OptionalField } from '../../common/dto-fields';
import { IsGreaterThan } from './dto-checks';

export const MAX_FREQUENCY_HZ = 300e9;
export const PREFERRED_SERIES = ['E12', 'E24'] as const;

export class LoadImpedanceDto {
  @NumberField({ min: 0, max: 1e6, description: 'Resistance R, ohms (must be above 0 for a lossless match)', example: 200 })
  @IsPositive()
  re: number;

  @NumberField({ min: -1e6, max: 1e6, description: 'Reactance X, ohms', example: -100 })
  im: number;
}

export class SweepDto {
  @NumberField({ min: 0, max: MAX_FREQUENCY_HZ, example: 400e6 })
  @IsPositive()
  fromHz: number;

  @NumberField({ min: 0, max: MAX_FREQUENCY_HZ, example: 600e6 })
  @IsGreaterThan('fromHz')
  toHz: number;

  @IntField({ optional: true, min: 2, max: 2001, description: 'Evenly spaced sweep points', example: 201 })
  points?: number;
}

export class MatchingRequestDto {
  @NumberField({ min: 0, max: MAX_FREQUENCY_HZ, description: 'Design frequency, Hz (at most 300 GHz)', example: 500e6 })
  @IsPositive()
  frequencyHz: number;

  @ApiProperty({ type: LoadImpedanceDto })
  @IsDefined()
  @ValidateNested()
  @Type(() => LoadImpedanceDto)
  loadOhms: LoadImpedanceDto;

  @NumberField({ min: 0, max: 1e4, description: 'Reference impedance Z0, ohms', example: 50 })
  @IsPositive()
  z0Ohms: number;

  @EnumField(PREFERRED_SERIES, { enumName: 'PreferredSeries', description: 'IEC 60063 series the values snap to' })
  series: (typeof PREFERRED_SERIES)[number];

  @ApiPropertyOptional({ type: SweepDto, description: 'Frequency range for the return-loss sweep; the load is taken as constant over it' })
  // Optional, but null is refused like every other field (null would reach the service as a value).
  @OptionalField()
  @ValidateNested()
  @Type(() => SweepDto)
  sweep?: SweepDto;
}

export class MatchingElementDto {
  @ApiProperty({ enum: ['series', 'shunt'] }) connection: 'series' | 'shunt';
  @ApiProperty({ enum: ['load-side', 'source-side'], description: 'Next to the load, or next to the Z0 source' }) position: 'load-side' | 'source-side';
  @ApiProperty({ enum: ['inductor', 'capacitor', 'none'], description: '"none": a series short or an open shunt' }) kind: 'inductor' | 'capacitor' | 'none';
  @ApiProperty({ type: Number, nullable: true }) inductanceNh: number | null;
  @ApiProperty({ type: Number, nullable: true }) capacitancePf: number | null;
}

export class SweepPointDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive dB; null where the match is perfect' }) returnLossDb: number | null;
  @ApiProperty({ type: Number, nullable: true }) vswr: number | null;
}

export class NetworkDto {
  @ApiProperty({ type: [MatchingElementDto], description: 'Load-side element first' }) elements: MatchingElementDto[];
  @ApiProperty({ type: [SweepPointDto], description: 'Empty without a sweep' }) sweep: SweepPointDto[];
}

export class MatchingSolutionDto {
  @ApiProperty({ enum: ['shunt-at-load', 'series-at-load'] }) topology: 'shunt-at-load' | 'series-at-load';
  @ApiProperty({ type: NetworkDto }) exact: NetworkDto;
  @ApiProperty({ type: NetworkDto, description: 'Every L and C replaced by its nearest preferred value' }) snapped: NetworkDto;
  @ApiProperty({ type: Number, nullable: true, description: 'Return loss of the snapped network at the design frequency, dB' }) snappedReturnLossDb:
    number | null;
}

export class MatchingResponseDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty() z0Ohms: number;
  @ApiProperty({ enum: PREFERRED_SERIES, enumName: 'PreferredSeries' }) series: string;
  @ApiProperty({ type: [MatchingSolutionDto], description: 'Usually two; one when both roots coincide, up to four when both topologies apply' })
  solutions: MatchingSolutionDto[];
}
