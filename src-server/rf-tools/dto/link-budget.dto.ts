import { ApiProperty } from '@nestjs/swagger';
import { IsPositive } from 'class-validator';
import { NumberField } from '../../common/dto-fields';
import { MAX_FREQUENCY_HZ } from './matching.dto';

export class LinkBudgetRequestDto {
  @NumberField({ min: 0, max: MAX_FREQUENCY_HZ, example: 868e6 })
  @IsPositive()
  frequencyHz: number;

  @NumberField({ min: 0, max: 1e8, description: 'Distance, m (far field only)', example: 1000 })
  @IsPositive()
  distanceM: number;

  @NumberField({ min: -100, max: 90, example: 14 }) txPowerDbm: number;
  @NumberField({ min: -60, max: 60, example: 2.15 }) txGainDbi: number;
  @NumberField({ min: -60, max: 60, example: 0 }) rxGainDbi: number;
  @NumberField({ min: 0, max: 300, description: 'Every fixed loss besides free-space path loss (feeds, cables, polarization, body), dB', example: 3 })
  lossesDb: number;
  @NumberField({ min: -200, max: 50, example: -120 }) rxSensitivityDbm: number;
}

export class LinkBudgetResponseDto {
  @ApiProperty() eirpDbm: number;
  @ApiProperty({ description: 'EIRP − 2.15 dB' }) erpDbm: number;
  @ApiProperty({ description: 'Friis free-space path loss, dB' }) pathLossDb: number;
  @ApiProperty() receivedDbm: number;
  @ApiProperty() marginDb: number;
  @ApiProperty({ description: 'Free-space distance where the margin reaches 0 dB' }) maxRangeM: number;
  @ApiProperty({ description: 'Free-space range factor for 6 dB less margin (≈ 0.5: every 6 dB halves the range)' }) rangeRatioFor6DbLess: number;
}
