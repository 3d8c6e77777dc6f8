import { ApiProperty } from '@nestjs/swagger';
import { IntField, EnumField, StringField } from '../../common/dto-fields';
import { UserRefDto } from '../../parts/dto/part-response.dto';
import { ANTENNA_ROLES, type AntennaRole } from './antenna-roles';

/** Multipart fields beside `file`. */
export class UploadInProductMeasurementDto {
  @StringField({ optional: true, maxLength: 500, description: 'Enclosure, fixture, simulation or chamber the file comes from' }) note?: string;
}

/** One port of the file as an antenna of a radio of the same product. */
export class PortAssignmentDto {
  @IntField({ min: 1, max: 64, description: 'Port number in the file, 1-based' }) port: number;
  @IntField({ min: 1, description: 'A radio of this product' }) radioId: number;
  @EnumField(ANTENNA_ROLES, { enumName: 'AntennaRole' }) role: AntennaRole;
}

export class PortAssignmentViewDto extends PortAssignmentDto {
  @ApiProperty() radioName: string;
}

export class InProductMeasurementDto {
  @ApiProperty() id: number;
  @ApiProperty() productId: number;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
  @ApiProperty() fileName: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty() sha256: string;
  @ApiProperty({ description: 'e.g. "Touchstone 1.0, 4-port, S MA"' }) sourceFormat: string;
  @ApiProperty({ description: 'Number of ports in the file' }) ports: number;
  @ApiProperty({ type: [Number], description: 'Reference resistance of each port, ohms' }) referenceOhms: number[];
  @ApiProperty() pointCount: number;
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ type: [PortAssignmentViewDto], description: 'Mapped ports only, by port number' }) portMapping: PortAssignmentViewDto[];
  @ApiProperty({ type: UserRefDto, nullable: true }) uploadedBy: UserRefDto | null;
  @ApiProperty() createdAt: string;
}

export class IsolationAntennaDto {
  @ApiProperty() measurementId: number;
  @ApiProperty() port: number;
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty({ enum: ANTENNA_ROLES, enumName: 'AntennaRole' }) role: AntennaRole;
}

export class BandPairIsolationDto {
  @ApiProperty({ description: 'Band of antenna a' }) bandA: string;
  @ApiProperty({ description: 'Band of antenna b' }) bandB: string;
  @ApiProperty({ type: Number, nullable: true, description: 'Least isolation over the ranges of both bands, dB; null without points there' })
  isolationDb: number | null;
}

export class IsolationCellDto {
  @ApiProperty({ description: 'Index into antennas' }) a: number;
  @ApiProperty({ description: 'Index into antennas' }) b: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Least isolation −20·log10|Sba| over every band pair, dB; null without points in those bands' })
  worstIsolationDb: number | null;
  @ApiProperty({ type: [BandPairIsolationDto] }) bandPairs: BandPairIsolationDto[];
}

export class CorrelationRowDto {
  @ApiProperty() radioId: number;
  @ApiProperty() radioName: string;
  @ApiProperty({ description: 'Index into antennas' }) a: number;
  @ApiProperty({ description: 'Index into antennas' }) b: number;
  @ApiProperty() bandId: number;
  @ApiProperty() band: string;
  @ApiProperty({ type: Number, nullable: true, description: 'Highest envelope correlation coefficient in the band (0 … 1); null where undefined or no points' })
  worstEcc: number | null;
  @ApiProperty({ description: 'ECC above it is flagged (0.5, common practice for mobile MIMO)' }) threshold: number;
  @ApiProperty({ type: Boolean, nullable: true, description: 'True when worstEcc exceeds the threshold' }) aboveThreshold: boolean | null;
}

export class ProductIsolationDto {
  @ApiProperty({ type: [IsolationAntennaDto], description: 'Every mapped port of the product, measurement by measurement' }) antennas: IsolationAntennaDto[];
  @ApiProperty({ type: [IsolationCellDto], description: 'One cell per pair of antennas of the same measurement (a < b)' }) isolation: IsolationCellDto[];
  @ApiProperty({ type: [CorrelationRowDto], description: 'Per band, for each pair of antennas of one radio' }) correlation: CorrelationRowDto[];
  @ApiProperty({ description: 'The assumption behind the correlation figures' }) correlationAssumption: string;
}
