import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsPositive, ValidateNested } from 'class-validator';
import { NumberField, OptionalField } from '../../common/dto-fields';
import { MAX_FREQUENCY_HZ } from './matching.dto';

export class ImpedanceDto {
  @NumberField({ min: 0, max: 1e9, description: 'Resistance, ohms', example: 75 }) re: number;
  @NumberField({ min: -1e9, max: 1e9, description: 'Reactance, ohms', example: 25 }) im: number;
}

/** Exactly one known quantity (impedance with its optional z0Ohms counts as one). */
export class ConversionRequestDto {
  @NumberField({ optional: true, min: 1, max: 1e6, example: 2 }) vswr?: number;
  @NumberField({ optional: true, min: 0, max: 200, description: 'Positive dB', example: 10 })
  @IsPositive()
  returnLossDb?: number;
  @NumberField({ optional: true, min: 0, max: 0.999999, description: '|Γ|, 0 ≤ |Γ| < 1', example: 0.333 }) gammaMagnitude?: number;

  @ApiPropertyOptional({ type: ImpedanceDto })
  // Optional, but null is refused like every other field (null would reach the service as a value).
  @OptionalField()
  @ValidateNested()
  @Type(() => ImpedanceDto)
  impedanceOhms?: ImpedanceDto;
  @NumberField({ optional: true, min: 0, max: 1e4, description: 'Reference for impedanceOhms; default 50 Ω', example: 50 })
  @IsPositive()
  z0Ohms?: number;

  @NumberField({ optional: true, min: 0, max: MAX_FREQUENCY_HZ, description: 'Frequency for the free-space wavelength, Hz', example: 868e6 })
  @IsPositive()
  frequencyHz?: number;
  @NumberField({ optional: true, min: -200, max: 100, example: 14 }) dbm?: number;
  @NumberField({ optional: true, min: 0, max: 1e9, example: 25 })
  @IsPositive()
  mw?: number;
  @NumberField({ optional: true, min: 0, max: 100, description: 'Efficiency, %', example: 50 })
  @IsPositive()
  efficiencyPct?: number;
  @NumberField({ optional: true, min: -100, max: 0, description: 'Efficiency, dB (≤ 0)', example: -3 }) efficiencyDb?: number;
}

export class ReflectionDto {
  @ApiProperty() gammaMagnitude: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null when infinite' }) vswr: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive dB; null for a perfect match' }) returnLossDb: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive dB' }) mismatchLossDb: number | null;
  @ApiProperty() transmittedPercent: number;
  @ApiProperty() reflectedPercent: number;
}

export class GammaDto {
  @ApiProperty() re: number;
  @ApiProperty() im: number;
  @ApiProperty() magnitude: number;
  @ApiProperty() angleDeg: number;
}

export class WavelengthDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty() wavelengthMm: number;
  @ApiProperty() halfWaveMm: number;
  @ApiProperty() quarterWaveMm: number;
}

export class PowerDto {
  @ApiProperty() dbm: number;
  @ApiProperty() mw: number;
  @ApiProperty() watts: number;
}

export class EfficiencyDto {
  @ApiProperty() percent: number;
  @ApiProperty() db: number;
}

export class ConversionResponseDto {
  @ApiProperty({ description: 'The field that was given' }) input: string;
  @ApiPropertyOptional({ type: ReflectionDto }) reflection?: ReflectionDto;
  @ApiPropertyOptional({ type: GammaDto, description: 'Γ of impedanceOhms against z0Ohms' }) gamma?: GammaDto;
  @ApiPropertyOptional({ type: WavelengthDto, description: 'Free-space values' }) wavelength?: WavelengthDto;
  @ApiPropertyOptional({ type: PowerDto }) power?: PowerDto;
  @ApiPropertyOptional({ type: EfficiencyDto }) efficiency?: EfficiencyDto;
}
