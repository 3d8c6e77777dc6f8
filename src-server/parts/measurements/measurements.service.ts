import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError, NotFoundError, ValidationFailedError } from '../../common/domain-error';
import { AuditService } from '../../audit/audit.service';
import { looksBinary } from '../../storage/limited-file-upload';
import { StoredFiles, type StoredOriginal } from '../../storage/stored-files.service';
import { type UploadedFile, requireFile } from '../../storage/uploaded-file';
import { reflectionCurveFromGamma, returnLossDbSeries, vswrSeries } from '../../rf/reflection';
import { touchPart } from '../catalogue-revision';
import { Measurement } from './measurement.entity';
import { type ParsedCurve, checkStorableCurve, parseCurveCsv, parseTouchstoneS11 } from './measurement-parsers';
import { Part } from '../part.entity';
import { assertCanEdit } from '../part-access';
import { packFloat64, unpackFloat64 } from './point-codec';
import { measurementDto, PartsService } from '../catalogue/parts.service';
import type { CurvePreviewDto, UploadMeasurementDto, UploadMeasurementResultDto } from '../dto/upload.dto';
import type { MeasurementPointsDto } from '../dto/part-response.dto';
import { BASES_OF_KIND, type MeasurementBasis, type MeasurementKind } from '../part.types';

const PREVIEW_POINTS = 400;
/** 100,000 points of a two-port Touchstone file in RI stay well under this. */
export const MEASUREMENT_MAX_BYTES = 16 * 1024 * 1024;

/** Served and stored by the measurement's kind (Touchstone for s11, CSV for the others), never as the uploader declared. */
export function measurementContentType(kind: MeasurementKind): string {
  return kind === 's11' ? 'text/plain' : 'text/csv';
}

/** The basis a curve of this kind must state (form field `basis`): efficiency radiation | total, gains peak | realized, none for s11. */
export function measurementBasisOf(kind: MeasurementKind, basis: MeasurementBasis | undefined): MeasurementBasis | null {
  const allowed = BASES_OF_KIND[kind];
  if (allowed.length === 0) {
    if (basis === undefined) return null;
    throw new ValidationFailedError([{ field: 'basis', message: `an ${kind} curve has no basis; leave the field out` }]);
  }
  if (basis === undefined) throw new ValidationFailedError([{ field: 'basis', message: `is required for ${kind}: one of ${allowed.join(', ')}` }]);
  if (!allowed.includes(basis)) throw new ValidationFailedError([{ field: 'basis', message: `must be one of ${allowed.join(', ')} for ${kind}` }]);
  return basis;
}

function previewOf(curve: ParsedCurve): CurvePreviewDto {
  const n = curve.frequenciesHz.length;
  const step = Math.max(1, Math.ceil(n / PREVIEW_POINTS));
  const picks: number[] = [];
  for (let i = 0; i < n; i += step) picks.push(i);
  if (picks[picks.length - 1] !== n - 1) picks.push(n - 1);
  let values: ArrayLike<number> = curve.valuesA;
  if (curve.kind === 's11')
    values = returnLossDbSeries(reflectionCurveFromGamma(curve.frequenciesHz, curve.valuesA, curve.valuesB!, curve.referenceOhms ?? 50));
  return {
    kind: curve.kind,
    sourceFormat: curve.sourceFormat,
    pointCount: n,
    fromMhz: curve.frequenciesHz[0] / 1e6,
    toMhz: curve.frequenciesHz[n - 1] / 1e6,
    referenceOhms: curve.referenceOhms,
    valueLabel: curve.kind === 's11' ? 'Return loss (dB)' : curve.kind === 'efficiency' ? 'Efficiency (%)' : 'Gain (dBi)',
    frequenciesMhz: picks.map((i) => curve.frequenciesHz[i] / 1e6),
    values: picks.map((i) => values[i]),
  };
}

@Injectable()
export class MeasurementsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly files: StoredFiles,
    private readonly parts: PartsService,
    private readonly audit: AuditService,
  ) {}

  /** The one validation of a measurement file: the dry run ("Check file"), the upload and the demo seeder all call it. */
  parse(file: UploadedFile, input: UploadMeasurementDto): ParsedCurve {
    measurementBasisOf(input.kind, input.basis);
    if (file.size > MEASUREMENT_MAX_BYTES) {
      throw new DomainError(
        'MEASUREMENT_FILE_TOO_LARGE',
        `file: a measurement file may be at most ${MEASUREMENT_MAX_BYTES / 1048576} MiB; nothing was stored`,
        413,
        { field: 'file', limitBytes: MEASUREMENT_MAX_BYTES },
      );
    }
    if (looksBinary(file.buffer)) {
      throw new DomainError('MEASUREMENT_TYPE_NOT_ALLOWED', `file: ${file.originalname} is not a text file; curves are Touchstone (s11) or CSV text`, 415, {
        field: 'file',
      });
    }
    const curve =
      input.kind === 's11'
        ? parseTouchstoneS11(file.buffer, file.originalname)
        : parseCurveCsv(file.buffer, input.kind, { frequencyUnit: input.frequencyUnit, valueUnit: input.valueUnit });
    return checkStorableCurve(curve);
  }

  /** Parse first (a bad file stores nothing), then the original and its row together through StoredFiles. */
  async upload(partId: number, maybeFile: UploadedFile | undefined, input: UploadMeasurementDto, actor: AuthUser): Promise<UploadMeasurementResultDto> {
    const part = await this.dataSource.getRepository(Part).findOneBy({ id: partId });
    if (!part) throw new NotFoundError('part', partId);
    assertCanEdit(actor, part, 'upload data to');
    const file = requireFile(maybeFile);
    const curve = this.parse(file, input);
    const preview = previewOf(curve);
    if (input.dryRun) return { measurement: null, preview };
    const stored = await this.store(partId, file, input, curve, actor);
    return { measurement: measurementDto(stored, true), preview };
  }

  /** Also used by the demo seeder, so demo curves take the same path as uploads. */
  async store(
    partId: number,
    file: UploadedFile,
    input: Omit<UploadMeasurementDto, 'dryRun'>,
    curve: ParsedCurve,
    actor: AuthUser | null,
  ): Promise<Measurement> {
    const contentType = measurementContentType(curve.kind);
    const id = await this.files.store({ keyPrefix: ['parts', partId, 'measurements'], file, contentType }, async (manager, stored) => {
      const locked = await this.parts.lockPart(manager, partId);
      if (actor) assertCanEdit(actor, locked, 'upload data to');
      const n = curve.frequenciesHz.length;
      const inserted = await manager.insert(Measurement, {
        ...stored,
        partId,
        kind: curve.kind,
        basis: measurementBasisOf(curve.kind, input.basis),
        groundLengthMm: input.groundLengthMm ?? null,
        groundWidthMm: input.groundWidthMm ?? null,
        conditions: input.conditions ?? null,
        sourceFormat: curve.sourceFormat,
        referenceOhms: curve.referenceOhms,
        pointCount: n,
        fromHz: curve.frequenciesHz[0],
        toHz: curve.frequenciesHz[n - 1],
        frequenciesHz: packFloat64(curve.frequenciesHz),
        valuesA: packFloat64(curve.valuesA),
        valuesB: curve.valuesB ? packFloat64(curve.valuesB) : null,
        uploadedById: actor?.id ?? null,
      });
      const measurementId: number = inserted.identifiers[0].id;
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'measurement-uploaded',
        userId: actor?.id ?? null,
        changes: {
          measurementId,
          kind: curve.kind,
          basis: input.basis ?? null,
          fileName: file.originalname,
          points: n,
          groundLengthMm: input.groundLengthMm ?? null,
          groundWidthMm: input.groundWidthMm ?? null,
        },
      });
      return measurementId;
    });
    return this.dataSource.getRepository(Measurement).findOneOrFail({ where: { id }, relations: { uploadedBy: true } });
  }

  async points(partId: number, measurementId: number): Promise<MeasurementPointsDto> {
    const row = await this.dataSource
      .getRepository(Measurement)
      .createQueryBuilder('m')
      .addSelect(['m.frequenciesHz', 'm.valuesA', 'm.valuesB'])
      .where('m.id = :measurementId AND m.part_id = :partId', { measurementId, partId })
      .getOne();
    if (!row) throw new NotFoundError('measurement', measurementId);
    const frequenciesHz = unpackFloat64(row.frequenciesHz);
    const a = unpackFloat64(row.valuesA);
    if (row.kind !== 's11') return { id: row.id, kind: row.kind, frequenciesHz: [...frequenciesHz], values: [...a] };
    const curve = reflectionCurveFromGamma(frequenciesHz, a, unpackFloat64(row.valuesB), row.referenceOhms ?? 50);
    return {
      id: row.id,
      kind: row.kind,
      frequenciesHz: [...frequenciesHz],
      values: [...curve.gammaMagnitude],
      vswr: [...vswrSeries(curve)].map((v) => (Number.isFinite(v) ? v : 1e6)),
      returnLossDb: [...returnLossDbSeries(curve)],
    };
  }

  /** Served with the content type stored for its kind (see measurementContentType). */
  file(partId: number, measurementId: number): Promise<StoredOriginal> {
    return this.files.original(Measurement, { id: measurementId, partId }, 'measurement', measurementId);
  }

  async remove(partId: number, measurementId: number, actor: AuthUser): Promise<void> {
    await this.files.removeWithin(async (manager, drop) => {
      const part = await this.parts.lockPart(manager, partId);
      assertCanEdit(actor, part, 'delete data of');
      const row = await manager.findOneBy(Measurement, { id: measurementId, partId });
      if (!row) throw new NotFoundError('measurement', measurementId);
      await drop(Measurement, row);
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'measurement-deleted',
        userId: actor.id,
        changes: { measurementId, kind: row.kind, fileName: row.fileName },
      });
    });
  }
}
