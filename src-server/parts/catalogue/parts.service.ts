import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { NotFoundError, ValidationFailedError, type FieldProblem } from '../../common/domain-error';
import { AuditService, diffFields } from '../../audit/audit.service';
import { RevisionCache, type RevisionReader } from '../../common/revision-cache';
import { transactionWithRetry } from '../../common/transaction-retry';
import type { FrequencyRange } from '../../rf/curves';
import { PartAlternate } from '../sourcing/alternate.entity';
import { catalogueRevisionReader, touchPart } from '../catalogue-revision';
import { PartDocument } from '../documents/document.entity';
import { Manufacturer } from '../manufacturer.entity';
import { Measurement } from '../measurements/measurement.entity';
import { loadCurrentCurves } from '../measurements/measurement-curves';
import { PartOffer } from '../sourcing/offer.entity';
import { Part } from '../part.entity';
import { assertCanEdit, partAccess } from '../part-access';
import { coveredRangesOf, figuresForRange } from './part-figures';
import { iso, searchTextOf, specBandClaim, specBandDto, userRef } from '../part-mapping';
import { partErrors } from '../parts.exception';
import type { ReviewState } from '../part.types';
import { SpecBand } from '../spec-band.entity';
import { type CreatePartDto, SPEC_BAND_DEFAULTS, type SpecBandInputDto, type UpdatePartDto } from '../dto/part-input.dto';
import type { DocumentDto, MeasurementDto, OfferDto, PartDetailDto } from '../dto/part-response.dto';

/** Part fields an update may change, in the order the audit log lists them. */
const EDITABLE_FIELDS = [
  'mpn',
  'title',
  'formFactor',
  'mounting',
  'connector',
  'polarization',
  'nominalImpedanceOhms',
  'lengthMm',
  'widthMm',
  'heightMm',
  'evalGroundLengthMm',
  'evalGroundWidthMm',
  'tempMinC',
  'tempMaxC',
  'lifecycle',
  'notes',
] as const;
const REQUIRED_ON_UPDATE = ['mpn', 'title', 'formFactor', 'connector', 'polarization', 'nominalImpedanceOhms', 'lifecycle'] as const;

export const measurementDto = (m: Measurement, current: boolean): MeasurementDto => ({
  id: m.id,
  kind: m.kind,
  basis: m.basis,
  groundLengthMm: m.groundLengthMm,
  groundWidthMm: m.groundWidthMm,
  conditions: m.conditions,
  fileName: m.fileName,
  sizeBytes: m.sizeBytes,
  sha256: m.sha256,
  sourceFormat: m.sourceFormat,
  referenceOhms: m.referenceOhms,
  pointCount: m.pointCount,
  fromMhz: m.fromHz / 1e6,
  toMhz: m.toHz / 1e6,
  current,
  uploadedBy: userRef(m.uploadedBy),
  createdAt: m.createdAt.toISOString(),
});

export const documentDto = (d: PartDocument): DocumentDto => ({
  id: d.id,
  kind: d.kind,
  title: d.title,
  fileName: d.fileName,
  contentType: d.contentType,
  sizeBytes: d.sizeBytes,
  sha256: d.sha256,
  uploadedBy: userRef(d.uploadedBy),
  createdAt: d.createdAt.toISOString(),
});

export const offerDto = (o: PartOffer): OfferDto => ({
  id: o.id,
  supplier: o.supplier,
  sku: o.sku,
  currency: o.currency,
  priceBreaks: o.priceBreaks,
  moq: o.moq,
  stock: o.stock,
  leadTimeDays: o.leadTimeDays,
  lastCheckedOn: o.lastCheckedOn,
  version: o.version,
});

/** The bases a datasheet line states, or the usual ones where it does not (SPEC_BAND_DEFAULTS). */
export function specBandBases(band: SpecBandInputDto): Pick<SpecBand, 'efficiencyBasis' | 'efficiencyStatistic' | 'gainBasis'> {
  return {
    efficiencyBasis: band.efficiencyBasis ?? SPEC_BAND_DEFAULTS.efficiencyBasis,
    efficiencyStatistic: band.efficiencyStatistic ?? SPEC_BAND_DEFAULTS.efficiencyStatistic,
    gainBasis: band.gainBasis ?? SPEC_BAND_DEFAULTS.gainBasis,
  };
}

export function checkSpecBands(bands: SpecBandInputDto[] | undefined, prefix = 'specBands'): FieldProblem[] {
  const problems: FieldProblem[] = [];
  (bands ?? []).forEach((band, i) => {
    if (!(band.fromMhz < band.toMhz)) problems.push({ field: `${prefix}.${i}.toMhz`, message: `must be above fromMhz (${band.fromMhz} MHz)` });
  });
  return problems;
}

/** What the per-caller permissions of a part page depend on. */
type PartOwner = { id: number; createdById: number | null; reviewState: ReviewState };

const DETAIL_CACHE_SIZE = 500;

@Injectable()
export class PartsService {
  /** Part pages by part and asked ranges, at the catalogue revision read before building them (every part write bumps it). */
  private readonly details = new RevisionCache<{ owner: PartOwner; detail: Omit<PartDetailDto, 'permissions'> }>(DETAIL_CACHE_SIZE);
  private readonly catalogueRevision: RevisionReader;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {
    this.catalogueRevision = catalogueRevisionReader(dataSource);
  }

  /** Locks the part row for the rest of the transaction; 404 if it does not exist. */
  async lockPart(manager: EntityManager, id: number): Promise<Part> {
    const part = await manager.findOne(Part, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!part) throw new NotFoundError('part', id);
    return part;
  }

  async manufacturerId(manager: EntityManager, name: string): Promise<number> {
    const trimmed = name.trim();
    await manager.query('INSERT IGNORE INTO manufacturers (name) VALUES (?)', [trimmed]);
    const [row] = await manager.query('SELECT id FROM manufacturers WHERE name = ?', [trimmed]);
    return row.id;
  }

  private async assertMpnFree(manager: EntityManager, manufacturerId: number, manufacturer: string, mpn: string, exceptId?: number): Promise<void> {
    const [row] = await manager.query('SELECT id FROM parts WHERE manufacturer_id = ? AND mpn = ?', [manufacturerId, mpn]);
    if (row && row.id !== exceptId) throw partErrors.duplicateMpn(manufacturer, mpn);
  }

  private async replaceSpecBands(manager: EntityManager, partId: number, bands: SpecBandInputDto[]): Promise<void> {
    await manager.delete(SpecBand, { partId });
    if (bands.length === 0) return;
    await manager.insert(
      SpecBand,
      bands.map((b) => ({
        partId,
        fromMhz: b.fromMhz,
        toMhz: b.toMhz,
        maxVswr: b.maxVswr ?? null,
        minReturnLossDb: b.minReturnLossDb ?? null,
        efficiencyPct: b.efficiencyPct ?? null,
        ...specBandBases(b),
        peakGainDbi: b.peakGainDbi ?? null,
        averageGainDbi: b.averageGainDbi ?? null,
      })),
    );
  }

  /** Inside the caller's transaction: used by the API, the CSV import and the demo seeder. */
  async createIn(manager: EntityManager, input: CreatePartDto, actorId: number | null, action = 'created', fixedId?: number): Promise<number> {
    const problems = checkSpecBands(input.specBands);
    if (problems.length) throw new ValidationFailedError(problems);
    const manufacturerId = await this.manufacturerId(manager, input.manufacturer);
    await this.assertMpnFree(manager, manufacturerId, input.manufacturer.trim(), input.mpn);
    const fields = {
      manufacturerId,
      mpn: input.mpn,
      title: input.title,
      formFactor: input.formFactor,
      mounting: input.mounting ?? null,
      connector: input.connector,
      polarization: input.polarization,
      nominalImpedanceOhms: input.nominalImpedanceOhms ?? 50,
      lengthMm: input.lengthMm ?? null,
      widthMm: input.widthMm ?? null,
      heightMm: input.heightMm ?? null,
      evalGroundLengthMm: input.evalGroundLengthMm ?? null,
      evalGroundWidthMm: input.evalGroundWidthMm ?? null,
      tempMinC: input.tempMinC ?? null,
      tempMaxC: input.tempMaxC ?? null,
      lifecycle: input.lifecycle ?? 'active',
      notes: input.notes ?? null,
    };
    const inserted = await manager.insert(Part, {
      ...(fixedId ? { id: fixedId } : {}),
      ...fields,
      reviewState: 'draft',
      createdById: actorId,
      searchText: searchTextOf(input.manufacturer.trim(), fields),
      version: 1,
    });
    const id: number = inserted.identifiers[0].id;
    await this.replaceSpecBands(manager, id, input.specBands ?? []);
    await touchPart(manager, id);
    await this.audit.record(manager, {
      entityType: 'part',
      entityId: id,
      action,
      userId: actorId,
      changes: { manufacturer: input.manufacturer.trim(), ...fields, manufacturerId: undefined, specBands: input.specBands ?? [] },
    });
    return id;
  }

  async create(input: CreatePartDto, actor: AuthUser): Promise<PartDetailDto> {
    const id = await transactionWithRetry(this.dataSource, (manager) => this.createIn(manager, input, actor.id));
    return this.getDetail(id, actor);
  }

  async update(id: number, input: UpdatePartDto, actor: AuthUser): Promise<PartDetailDto> {
    await this.dataSource.transaction(async (manager) => {
      const part = await this.lockPart(manager, id);
      assertCanEdit(actor, part);
      if (part.version !== input.version) throw partErrors.versionConflict(id, input.version, part.version);
      const nulls = REQUIRED_ON_UPDATE.filter((f) => f in input && (input as unknown as Record<string, unknown>)[f] === null);
      const problems = [...nulls.map((field) => ({ field, message: 'cannot be cleared' })), ...checkSpecBands(input.specBands)];
      if (problems.length) throw new ValidationFailedError(problems);

      const changes: Partial<Part> = {};
      for (const field of EDITABLE_FIELDS) if (field in input && input[field] !== undefined) (changes as Record<string, unknown>)[field] = input[field];
      const diff: Record<string, unknown> = diffFields(part, changes, [...EDITABLE_FIELDS]);
      let manufacturerName = (await manager.findOneByOrFail(Manufacturer, { id: part.manufacturerId })).name;
      if (input.manufacturer !== undefined && input.manufacturer.trim() !== manufacturerName) {
        changes.manufacturerId = await this.manufacturerId(manager, input.manufacturer);
        diff.manufacturer = [manufacturerName, input.manufacturer.trim()];
        manufacturerName = input.manufacturer.trim();
      }
      if (changes.manufacturerId !== undefined || changes.mpn !== undefined) {
        await this.assertMpnFree(manager, changes.manufacturerId ?? part.manufacturerId, manufacturerName, changes.mpn ?? part.mpn, id);
      }
      if (input.specBands) {
        const before = (await manager.findBy(SpecBand, { partId: id })).map(specBandDto).map(({ id: _id, ...rest }) => rest);
        const after = input.specBands.map((b) => ({
          fromMhz: b.fromMhz,
          toMhz: b.toMhz,
          maxVswr: b.maxVswr ?? null,
          minReturnLossDb: b.minReturnLossDb ?? null,
          efficiencyPct: b.efficiencyPct ?? null,
          ...specBandBases(b),
          peakGainDbi: b.peakGainDbi ?? null,
          averageGainDbi: b.averageGainDbi ?? null,
        }));
        if (JSON.stringify(before) !== JSON.stringify(after)) diff.specBands = [before, after];
        await this.replaceSpecBands(manager, id, input.specBands);
      }
      const merged = { ...part, ...changes };
      await manager.update(Part, { id }, { ...changes, searchText: searchTextOf(manufacturerName, merged), version: part.version + 1 });
      await touchPart(manager, id);
      await this.audit.record(manager, { entityType: 'part', entityId: id, action: 'updated', userId: actor.id, changes: diff });
    });
    return this.getDetail(id, actor);
  }

  /** The part with everything the part page shows; figures per spec band and per asked range. */
  async getDetail(id: number, actor: AuthUser, ranges: FrequencyRange[] = []): Promise<PartDetailDto> {
    const revision = await this.catalogueRevision.current();
    const key = `${id}|${ranges.map((r) => `${r.fromHz}-${r.toHz}`).join(',')}`;
    const { owner, detail } = await this.details.getOrLoad(key, revision, () => this.buildDetail(id, ranges));
    return {
      ...detail,
      permissions: {
        edit: partAccess.canEdit(actor, owner),
        uploadData: partAccess.canUploadData(actor, owner),
        submit: partAccess.canSubmit(actor, owner),
        review: partAccess.canReview(actor),
        editSourcing: partAccess.canEditSourcing(actor),
      },
    };
  }

  private async buildDetail(id: number, ranges: FrequencyRange[]): Promise<{ owner: PartOwner; detail: Omit<PartDetailDto, 'permissions'> }> {
    const manager = this.dataSource.manager;
    const part = await manager.findOne(Part, {
      where: { id },
      relations: { manufacturer: true, createdBy: true, submittedBy: true, reviewedBy: true, specBands: true },
    });
    if (!part) throw new NotFoundError('part', id);
    const [measurements, documents, offers, alternates, curvesByPart] = await Promise.all([
      manager.find(Measurement, { where: { partId: id }, relations: { uploadedBy: true }, order: { kind: 'ASC', id: 'DESC' } }),
      manager.find(PartDocument, { where: { partId: id }, relations: { uploadedBy: true }, order: { id: 'ASC' } }),
      manager.find(PartOffer, { where: { partId: id }, order: { supplier: 'ASC', id: 'ASC' } }),
      manager.find(PartAlternate, { where: { partId: id }, relations: { alternatePart: { manufacturer: true } }, order: { alternatePartId: 'ASC' } }),
      loadCurrentCurves(manager, { ids: [id] }),
    ]);
    const specBands = [...part.specBands].sort((a, b) => a.fromMhz - b.fromMhz || a.id - b.id);
    const curves = curvesByPart.get(id);
    const figureRanges = [...specBands.map((b) => ({ fromHz: b.fromMhz * 1e6, toHz: b.toMhz * 1e6 })), ...ranges];
    const partCurves = {
      s11: curves?.s11?.curve ?? null,
      efficiencyPercent: curves?.efficiency?.curve ?? null,
      efficiencyBasis: curves?.efficiency?.basis ?? null,
      peakGainDbi: curves?.peakGain?.curve ?? null,
      averageGainDbi: curves?.averageGain?.curve ?? null,
      specBands: specBands.map(specBandClaim),
    };
    const currentIds = new Set([
      curves?.s11?.measurementId,
      curves?.efficiency?.measurementId,
      curves?.peakGain?.measurementId,
      curves?.averageGain?.measurementId,
    ]);
    const detail: Omit<PartDetailDto, 'permissions'> = {
      id: part.id,
      manufacturer: part.manufacturer.name,
      mpn: part.mpn,
      title: part.title,
      formFactor: part.formFactor,
      mounting: part.mounting,
      connector: part.connector,
      polarization: part.polarization,
      nominalImpedanceOhms: part.nominalImpedanceOhms,
      lengthMm: part.lengthMm,
      widthMm: part.widthMm,
      heightMm: part.heightMm,
      evalGroundLengthMm: part.evalGroundLengthMm,
      evalGroundWidthMm: part.evalGroundWidthMm,
      tempMinC: part.tempMinC,
      tempMaxC: part.tempMaxC,
      lifecycle: part.lifecycle,
      reviewState: part.reviewState,
      reviewComment: part.reviewComment,
      notes: part.notes,
      version: part.version,
      createdBy: userRef(part.createdBy),
      submittedBy: userRef(part.submittedBy),
      submittedAt: iso(part.submittedAt),
      reviewedBy: userRef(part.reviewedBy),
      reviewedAt: iso(part.reviewedAt),
      createdAt: part.createdAt.toISOString(),
      updatedAt: part.updatedAt.toISOString(),
      specBands: specBands.map(specBandDto),
      measurements: measurements.map((m) => measurementDto(m, currentIds.has(m.id))),
      figures: figureRanges.map((range) => figuresForRange(partCurves, range)),
      coveredRanges: coveredRangesOf(partCurves),
      documents: documents.map(documentDto),
      offers: offers.map(offerDto),
      alternates: alternates.map((a) => ({
        partId: a.alternatePartId,
        manufacturer: a.alternatePart.manufacturer.name,
        mpn: a.alternatePart.mpn,
        reviewState: a.alternatePart.reviewState,
        kind: a.kind,
        note: a.note,
      })),
    };
    return { owner: { id: part.id, createdById: part.createdById, reviewState: part.reviewState }, detail };
  }

  async history(id: number, limit?: number, offset?: number) {
    if (!(await this.dataSource.getRepository(Part).existsBy({ id }))) throw new NotFoundError('part', id);
    return this.audit.list({ entityType: 'part', entityId: id, limit, offset });
  }
}
