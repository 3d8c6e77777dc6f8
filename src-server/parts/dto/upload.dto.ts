import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { BoolField, EnumField, NumberField, StringField } from '../../common/dto-fields';
import { DOCUMENT_KINDS, type DocumentKind, MEASUREMENT_BASES, MEASUREMENT_KINDS, type MeasurementBasis, type MeasurementKind } from '../part.types';
import { FREQUENCY_UNITS, VALUE_UNITS, type ValueUnit } from '../measurements/measurement-parsers';
import type { FrequencyUnit } from '../../rf/touchstone';
import { MeasurementDto } from './part-response.dto';

/** Multipart fields beside `file`. */
export class UploadMeasurementDto {
  @EnumField(MEASUREMENT_KINDS, { enumName: 'MeasurementKind', description: 's11 takes a Touchstone file; the others a CSV' }) kind: MeasurementKind;
  @EnumField(MEASUREMENT_BASES, {
    enumName: 'MeasurementBasis',
    optional: true,
    description:
      'Required for efficiency (radiation: mismatch left out, or total: mismatch included) and for gains (peak: the antenna gain, or realized: mismatch included); not sent for s11',
  })
  basis?: MeasurementBasis;
  @NumberField({ optional: true, min: 0, max: 5000, description: 'Ground plane the curve was measured on: length, mm' }) groundLengthMm?: number;
  @NumberField({ optional: true, min: 0, max: 5000, description: 'Ground plane width, mm' }) groundWidthMm?: number;
  @StringField({ optional: true, maxLength: 500, description: 'Conditions: fixture, enclosure, cable, chamber' }) conditions?: string;
  @EnumField(FREQUENCY_UNITS, { optional: true, description: 'CSV frequency unit when the header does not say' }) frequencyUnit?: FrequencyUnit;
  @EnumField(VALUE_UNITS, { optional: true, description: 'CSV value unit when the header does not say: efficiency %, dB or ratio; gain dBi' })
  valueUnit?: ValueUnit;
  @BoolField({ optional: true, description: 'Parse and preview only; nothing is stored' }) dryRun?: boolean;
}

export class UploadDocumentDto {
  @EnumField(DOCUMENT_KINDS, { enumName: 'DocumentKind' }) kind: DocumentKind;
  @StringField({ optional: true, maxLength: 200, description: 'Defaults to the file name' }) title?: string;
}

export class CurvePreviewDto {
  @ApiProperty({ enum: MEASUREMENT_KINDS, enumName: 'MeasurementKind' }) kind: MeasurementKind;
  @ApiProperty() sourceFormat: string;
  @ApiProperty() pointCount: number;
  @ApiProperty() fromMhz: number;
  @ApiProperty() toMhz: number;
  @ApiProperty({ type: Number, nullable: true }) referenceOhms: number | null;
  @ApiProperty({ description: 'Return loss dB (s11), efficiency % or gain dBi' }) valueLabel: string;
  @ApiProperty({ type: [Number], description: 'At most 400 points, evenly picked' }) frequenciesMhz: number[];
  @ApiProperty({ type: [Number] }) values: number[];
}

export class UploadMeasurementResultDto {
  @ApiPropertyOptional({ type: MeasurementDto, nullable: true, description: 'Null on a dry run' }) measurement: MeasurementDto | null;
  @ApiProperty({ type: CurvePreviewDto }) preview: CurvePreviewDto;
}
