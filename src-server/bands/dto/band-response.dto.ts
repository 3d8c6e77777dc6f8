import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { DUPLEX_MODES, type DuplexMode, RANGE_ROLES, type RangeRole, TECHNOLOGIES, type Technology } from '../band-domain';

export class BandRangeDto {
  @ApiProperty({ enum: RANGE_ROLES, enumName: 'RangeRole' }) role: RangeRole;
  @ApiProperty({ example: 699 }) fromMhz: number;
  @ApiProperty({ example: 716 }) toMhz: number;
}

export class BandSourceDto {
  @ApiProperty({ example: '3GPP TS 36.101' }) document: string;
  @ApiProperty({ example: 'Table 5.5-1 E-UTRA operating bands' }) table: string;
  @ApiPropertyOptional({ type: String, nullable: true, description: 'Spec release, corroboration and from-memory remarks' }) note: string | null;
}

export class MainLobeDto {
  @ApiProperty({ example: 1574.397 }) fromMhz: number;
  @ApiProperty({ example: 1576.443 }) toMhz: number;
}

export class BandDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology' }) technology: Technology;
  @ApiProperty({ example: 'B12' }) designation: string;
  @ApiProperty() name: string;
  @ApiProperty({ type: [BandRangeDto] }) ranges: BandRangeDto[];
  @ApiProperty({ enum: DUPLEX_MODES, enumName: 'DuplexMode' }) duplex: DuplexMode;
  @ApiProperty({ type: BandSourceDto }) source: BandSourceDto;
  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Carrier centre for GNSS signals and UWB channels' }) centreMhz: number | null;
  @ApiPropertyOptional({ type: Number, nullable: true }) bandwidthMhz: number | null;
  @ApiPropertyOptional({
    type: MainLobeDto,
    nullable: true,
    description:
      'GNSS only: the main lobe of the open-service signal (the ranges hold the full signal band); a GNSS radio is judged on it unless it needs the full band',
  })
  mainLobe: MainLobeDto | null;
  @ApiProperty({
    type: [String],
    description: 'Markets where the band is used (ISO 3166-1 codes, groupings EU, CEPT, ASIA, or global); indicative; empty when not stated',
  })
  regions: string[];
}

/** The short form used inside band sets. */
export class BandRefDto {
  @ApiProperty() id: number;
  @ApiProperty({ enum: TECHNOLOGIES, enumName: 'Technology' }) technology: Technology;
  @ApiProperty() designation: string;
  @ApiProperty() name: string;
}
