import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { NotFoundError } from '../../common/domain-error';
import { AuditService } from '../../audit/audit.service';
import { userRef } from '../../parts/part-mapping';
import { StoredFiles, type StoredOriginal } from '../../storage/stored-files.service';
import { type UploadedFile, requireFile } from '../../storage/uploaded-file';
import { packFloat64 } from '../../parts/measurements/point-codec';
import type { TouchstoneNetwork } from '../../rf/touchstone';
import { type ReflectionCurve, reflectionCurveFromNetwork } from '../../rf/reflection';
import type { AntennaRole } from './antenna-roles';
import { Product } from '../product.entity';
import { Radio } from '../radio.entity';
import { ProductsService } from '../products.service';
import { InProductMeasurement, InProductPort } from './in-product-measurement.entity';
import type { InProductMeasurementDto, ProductIsolationDto, UploadInProductMeasurementDto } from './in-product.dto';
import { parseInProductFile } from './in-product-file';
import { networkFromStored, packSMatrix } from './in-product-network';
import { checkPortAssignments } from './port-assignments';
import { loadEnvelopeCorrelationRule } from './envelope-correlation-rule';
import type { Finding } from '../../compatibility/engine/types';
import {
  type BandOfRadio,
  type MappedAntenna,
  type MeasuredAssembly,
  type RadioIsolation,
  isolationMatrix,
  radioIsolationLookup,
} from './in-product-isolation';

const MHZ = 1e6;

function dtoOf(row: InProductMeasurement, radioNames: ReadonlyMap<number, string>): InProductMeasurementDto {
  return {
    id: row.id,
    productId: row.productId,
    note: row.note,
    fileName: row.fileName,
    sizeBytes: row.sizeBytes,
    sha256: row.sha256,
    sourceFormat: row.sourceFormat,
    ports: row.ports,
    referenceOhms: row.referenceOhms,
    pointCount: row.pointCount,
    fromMhz: row.fromHz / MHZ,
    toMhz: row.toHz / MHZ,
    portMapping: [...(row.portMapping ?? [])]
      .sort((a, b) => a.port - b.port)
      .map((p) => ({ port: p.port, radioId: p.radioId, role: p.role, radioName: radioNames.get(p.radioId) ?? '' })),
    uploadedBy: userRef(row.uploadedBy),
    createdAt: row.createdAt.toISOString(),
  };
}

/** A stored in-product measurement with its S-matrix, as the evaluation and the isolation view read it. */
export interface StoredAssembly {
  readonly row: InProductMeasurement;
  readonly network: TouchstoneNetwork;
}

/** The S11 of one antenna as measured in the product, with where it came from. */
export interface MeasuredReflection {
  readonly radioId: number;
  readonly role: AntennaRole;
  readonly curve: ReflectionCurve;
  readonly measurementId: number;
  readonly fileName: string;
  readonly port: number;
  /** "measured in product, file housing.s4p, port 2" */
  readonly source: string;
}

export const antennaKey = (radioId: number, role: AntennaRole) => `${radioId}/${role}`;

@Injectable()
export class InProductMeasurementsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly files: StoredFiles,
    private readonly products: ProductsService,
    private readonly audit: AuditService,
  ) {}

  /** Parse first (a bad file stores nothing), then the original and its row together through StoredFiles. */
  async upload(
    productId: number,
    maybeFile: UploadedFile | undefined,
    input: UploadInProductMeasurementDto,
    actor: AuthUser | null,
  ): Promise<InProductMeasurementDto> {
    await this.products.assertExists(productId);
    const file = requireFile(maybeFile);
    const { network, sourceFormat } = parseInProductFile(file);
    const n = network.frequenciesHz.length;
    const id = await this.files.store({ keyPrefix: ['products', productId, 'in-product'], file, contentType: 'text/plain' }, async (manager, stored) => {
      await this.lockProduct(manager, productId);
      const inserted = await manager.insert(InProductMeasurement, {
        ...stored,
        productId,
        note: input.note ?? null,
        sourceFormat,
        ports: network.ports,
        referenceOhms: [...network.referenceOhms],
        pointCount: n,
        fromHz: network.frequenciesHz[0],
        toHz: network.frequenciesHz[n - 1],
        frequenciesHz: packFloat64(network.frequenciesHz),
        sMatrix: packSMatrix(network),
        uploadedById: actor?.id ?? null,
      });
      const measurementId: number = inserted.identifiers[0].id;
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: productId,
        action: 'in-product-measurement-uploaded',
        userId: actor?.id ?? null,
        changes: { measurementId, fileName: file.originalname, ports: network.ports, points: n },
      });
      return measurementId;
    });
    return this.get(productId, id);
  }

  async list(productId: number): Promise<InProductMeasurementDto[]> {
    await this.products.assertExists(productId);
    const rows = await this.dataSource.getRepository(InProductMeasurement).find({
      where: { productId },
      relations: { uploadedBy: true, portMapping: true },
      order: { id: 'ASC' },
    });
    const names = await this.radioNames(productId);
    return rows.map((row) => dtoOf(row, names));
  }

  async get(productId: number, measurementId: number): Promise<InProductMeasurementDto> {
    await this.products.assertExists(productId);
    const row = await this.dataSource
      .getRepository(InProductMeasurement)
      .findOne({ where: { id: measurementId, productId }, relations: { uploadedBy: true, portMapping: true } });
    if (!row) throw new NotFoundError('in-product measurement', measurementId);
    return dtoOf(row, await this.radioNames(productId));
  }

  file(productId: number, measurementId: number): Promise<StoredOriginal> {
    return this.files.original(InProductMeasurement, { id: measurementId, productId }, 'in-product measurement', measurementId);
  }

  async remove(productId: number, measurementId: number, actor: AuthUser): Promise<void> {
    await this.files.removeWithin(async (manager, drop) => {
      await this.lockProduct(manager, productId);
      const row = await manager.findOneBy(InProductMeasurement, { id: measurementId, productId });
      if (!row) throw new NotFoundError('in-product measurement', measurementId);
      await drop(InProductMeasurement, row);
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: productId,
        action: 'in-product-measurement-deleted',
        userId: actor.id,
        changes: { measurementId, fileName: row.fileName },
      });
    });
  }

  /** Replaces the whole port mapping of a measurement; 400 VALIDATION_FAILED naming `[i].port`, `[i].radioId` or `[i].role`. */
  async mapPorts(productId: number, measurementId: number, body: unknown, actor: AuthUser | null): Promise<InProductMeasurementDto> {
    await this.dataSource.transaction(async (manager) => {
      await this.lockProduct(manager, productId);
      const row = await manager.findOneBy(InProductMeasurement, { id: measurementId, productId });
      if (!row) throw new NotFoundError('in-product measurement', measurementId);
      const radios = await manager.find(Radio, { where: { productId }, select: { id: true } });
      const assignments = checkPortAssignments(body, row.ports, new Set(radios.map((r) => r.id)));
      await manager.delete(InProductPort, { measurementId });
      if (assignments.length)
        await manager.insert(
          InProductPort,
          assignments.map((a) => ({ ...a, measurementId })),
        );
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: productId,
        action: 'in-product-ports-mapped',
        userId: actor?.id ?? null,
        changes: { measurementId, ports: assignments },
      });
    });
    return this.get(productId, measurementId);
  }

  /** Every measurement of the product with a mapped port, S-matrix included. */
  async mappedAssemblies(productId: number): Promise<StoredAssembly[]> {
    const rows = await this.dataSource
      .getRepository(InProductMeasurement)
      .createQueryBuilder('m')
      .addSelect(['m.frequenciesHz', 'm.sMatrix'])
      .innerJoinAndSelect('m.portMapping', 'p')
      .where('m.product_id = :productId', { productId })
      .orderBy('m.id', 'ASC')
      .getMany();
    return rows.map((row) => ({ row, network: networkFromStored(row, row.frequenciesHz, row.sMatrix) }));
  }

  /** Each mapped antenna's in-product S11, keyed by antennaKey; the newest measurement wins where several map one antenna. */
  async measuredReflections(productId: number): Promise<Map<string, MeasuredReflection>> {
    const out = new Map<string, MeasuredReflection>();
    for (const { row, network } of await this.mappedAssemblies(productId)) {
      for (const p of row.portMapping) {
        out.set(antennaKey(p.radioId, p.role), {
          radioId: p.radioId,
          role: p.role,
          curve: reflectionCurveFromNetwork(network, p.port),
          measurementId: row.id,
          fileName: row.fileName,
          port: p.port,
          source: `measured in product, file ${row.fileName}, port ${p.port}`,
        });
      }
    }
    return out;
  }

  async isolation(productId: number): Promise<ProductIsolationDto> {
    const product = await this.products.getWithRadios(productId);
    const { measured, antennas } = await this.mappedAntennas(productId, new Map(product.radios.map((r) => [r.id, r.name])));
    const bandsOfRadio = new Map<number, BandOfRadio[]>(
      product.radios.map((r) => [
        r.id,
        r.bands.map((rb) => ({
          id: rb.band.id,
          designation: rb.band.designation,
          ranges: rb.band.ranges.map((range) => ({ fromHz: range.fromMhz * MHZ, toHz: range.toMhz * MHZ })),
        })),
      ]),
    );
    return isolationMatrix(measured, antennas, bandsOfRadio, loadEnvelopeCorrelationRule().parameters.maxEnvelopeCorrelation);
  }

  /**
   * The correlation rule's findings, by radio and band: each band where two antennas of one radio correlate above the
   * rule's limit (rules/system/envelope-correlation.json), with the figure and its assumption.
   */
  async correlationFindings(productId: number): Promise<Map<number, Map<number, Finding[]>>> {
    const rule = loadEnvelopeCorrelationRule();
    const matrix = await this.isolation(productId);
    const out = new Map<number, Map<number, Finding[]>>();
    for (const row of matrix.correlation) {
      if (!row.aboveThreshold || row.worstEcc === null) continue;
      const [a, b] = [matrix.antennas[row.a], matrix.antennas[row.b]];
      const byBand = out.get(row.radioId) ?? new Map<number, Finding[]>();
      const list = byBand.get(row.bandId) ?? [];
      list.push({
        ruleId: rule.id,
        severity: rule.severity,
        code: 'ENVELOPE_CORRELATION_HIGH',
        message:
          `envelope correlation between ${row.radioName} ${a.role} (port ${a.port}) and ${b.role} (port ${b.port}) reaches ${row.worstEcc.toFixed(2)} in ${row.band}, ` +
          `above ${rule.parameters.maxEnvelopeCorrelation} (from S-parameters, assuming lossless antennas in uniform multipath)`,
      });
      byBand.set(row.bandId, list);
      out.set(row.radioId, byBand);
    }
    return out;
  }

  /** Measured isolation between two radios of the product at a frequency, for the coexistence check. */
  async radioIsolation(productId: number): Promise<RadioIsolation> {
    const { measured, antennas } = await this.mappedAntennas(productId, new Map());
    return radioIsolationLookup(measured, antennas);
  }

  private async mappedAntennas(
    productId: number,
    radioName: ReadonlyMap<number, string>,
  ): Promise<{ measured: MeasuredAssembly[]; antennas: MappedAntenna[] }> {
    const assemblies = await this.mappedAssemblies(productId);
    const antennas: MappedAntenna[] = assemblies.flatMap(({ row }) =>
      [...row.portMapping]
        .sort((a, b) => a.port - b.port)
        .map((p) => ({ measurementId: row.id, port: p.port, radioId: p.radioId, radioName: radioName.get(p.radioId) ?? '', role: p.role })),
    );
    return { measured: assemblies.map(({ row, network }) => ({ measurementId: row.id, network })), antennas };
  }

  private async lockProduct(manager: EntityManager, productId: number): Promise<Product> {
    const product = await manager.findOne(Product, { where: { id: productId }, lock: { mode: 'pessimistic_write' } });
    if (!product) throw new NotFoundError('product', productId);
    return product;
  }

  private async radioNames(productId: number): Promise<Map<number, string>> {
    const radios = await this.dataSource.getRepository(Radio).find({ where: { productId }, select: { id: true, name: true } });
    return new Map(radios.map((r) => [r.id, r.name]));
  }
}
