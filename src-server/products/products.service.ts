import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager, In, IsNull, Not } from 'typeorm';
import { transactionWithRetry } from '../common/transaction-retry';
import { DomainError, NotFoundError, ValidationFailedError, VersionConflictError } from '../common/domain-error';
import type { AuthUser } from '../common/auth.decorators';
import { AuditService, type AuditEntryView, diffFields } from '../audit/audit.service';
import { Band } from '../bands/band.entity';
import { toBandDto } from '../bands/bands.service';
import { Product } from './product.entity';
import { Radio, RadioBand } from './radio.entity';
import { DEFAULT_GNSS_BANDWIDTH, type GnssBandwidth, type Technology } from '../bands/band-domain';
import { type ChannelInput, isReceiveOnly, type KnownBand, radioProblems, storedChannels } from './radio-rules';
import type { CreateProductDto, PersonRefDto, ProductDetailDto, ProductSummaryDto, SimultaneousTransmit, UpdateProductDto } from './dto/product.dto';
import type { CreateRadioDto, RadioDto, UpdateRadioDto } from './dto/radio.dto';
const PRODUCT_FIELDS: (keyof Product)[] = [
  'name',
  'code',
  'owner',
  'groundPlaneLengthMm',
  'groundPlaneWidthMm',
  'targetRegions',
  'notes',
  'simultaneousTransmit',
];

/** 'all' is stored as NULL, pairs as they are (each pair sorted, once). */
function storedSimultaneousTransmit(value: SimultaneousTransmit): number[][] | null {
  if (value === 'all') return null;
  const seen = new Map<string, number[]>();
  for (const [a, b] of value) seen.set(`${Math.min(a, b)},${Math.max(a, b)}`, [Math.min(a, b), Math.max(a, b)]);
  return [...seen.values()];
}

/** Each pair must name radios of this product: a 400 naming the field otherwise. */
function assertPairsOfRadios(pairs: number[][] | null, radioIds: readonly number[]): void {
  const unknown = (pairs ?? []).flat().filter((id) => !radioIds.includes(id));
  if (unknown.length > 0) {
    throw new ValidationFailedError([{ field: 'simultaneousTransmit', message: `radio ${unknown[0]} is not a radio of this product` }]);
  }
}
const RADIO_FIELDS: (keyof Radio)[] = [
  'name',
  'technology',
  'module',
  'transmitPowerDbm',
  'polarization',
  'connector',
  'feedLossDb',
  'gnssBandwidth',
  'notes',
  'antennaRoles',
];

/** A GNSS radio needs the main lobe unless it says otherwise; other radios have no GNSS bandwidth. */
function gnssBandwidthFor(technology: Technology, given: GnssBandwidth | null | undefined): GnssBandwidth | null {
  if (technology !== 'gnss') return given ?? null;
  return given ?? DEFAULT_GNSS_BANDWIDTH;
}

function toRadioDto(radio: Radio): RadioDto {
  const bands = [...(radio.bands ?? [])].sort((a, b) => a.position - b.position);
  return {
    id: radio.id,
    productId: radio.productId,
    name: radio.name,
    technology: radio.technology,
    module: radio.module,
    receiveOnly: isReceiveOnly(radio.technology),
    transmitPowerDbm: radio.transmitPowerDbm,
    polarization: radio.polarization,
    connector: radio.connector,
    feedLossDb: radio.feedLossDb,
    gnssBandwidth: radio.gnssBandwidth ?? null,
    antennaRoles: radio.antennaRoles?.length ? radio.antennaRoles : ['main'],
    notes: radio.notes,
    version: radio.version,
    bands: bands.map((rb) => ({ band: toBandDto(rb.band), certifiedMaxGainDbi: rb.certifiedMaxGainDbi, channels: rb.channels ?? null })),
    updatedAt: radio.updatedAt.toISOString(),
  };
}

const personRef = (user: { id: number; name: string } | null | undefined): PersonRefDto | null => (user ? { id: user.id, name: user.name } : null);

/** Loads the people a product summary names (creator, deleter) with the product. */
const PEOPLE = { createdBy: true, deletedBy: true } as const;

function toSummary(product: Product, radios: Pick<Radio, 'technology'>[]): ProductSummaryDto {
  return {
    id: product.id,
    name: product.name,
    code: product.code,
    owner: product.owner,
    groundPlaneLengthMm: product.groundPlaneLengthMm,
    groundPlaneWidthMm: product.groundPlaneWidthMm,
    targetRegions: product.targetRegions ?? [],
    notes: product.notes,
    simultaneousTransmit: product.simultaneousTransmit ?? 'all',
    version: product.version,
    radioCount: radios.length,
    technologies: [...new Set(radios.map((r) => r.technology))],
    createdAt: product.createdAt.toISOString(),
    updatedAt: product.updatedAt.toISOString(),
    createdBy: personRef(product.createdBy),
    deletedAt: product.deletedAt ? product.deletedAt.toISOString() : null,
    deletedBy: personRef(product.deletedBy),
  };
}

/** What the audit log keeps of a radio's bands: readable, and enough to see a gain change. */
const bandsForAudit = (bands: { designation: string; certifiedMaxGainDbi: number | null; channels?: { fromMhz: number; toMhz: number }[] | null }[]) =>
  bands.map((b) => {
    const gain = b.certifiedMaxGainDbi === null ? '' : ` (${b.certifiedMaxGainDbi} dBi)`;
    const channels = b.channels ? ` channels ${b.channels.map((c) => `${c.fromMhz}–${c.toMhz} MHz`).join(', ')}` : '';
    return `${b.designation}${gain}${channels}`;
  });

@Injectable()
export class ProductsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  /** The live products, or (deleted: true) the deleted ones, most recently deleted first. */
  async list(options: { deleted?: boolean } = {}): Promise<ProductSummaryDto[]> {
    const products = options.deleted
      ? await this.dataSource
          .getRepository(Product)
          .find({ where: { deletedAt: Not(IsNull()) }, withDeleted: true, relations: PEOPLE, order: { deletedAt: 'DESC', id: 'DESC' } })
      : await this.dataSource.getRepository(Product).find({ relations: PEOPLE, order: { name: 'ASC', id: 'ASC' } });
    const radios = products.length
      ? await this.dataSource.getRepository(Radio).find({ select: { productId: true, technology: true }, where: { productId: In(products.map((p) => p.id)) } })
      : [];
    const radiosByProduct = new Map<number, Radio[]>();
    for (const radio of radios) {
      const list = radiosByProduct.get(radio.productId);
      if (list) list.push(radio);
      else radiosByProduct.set(radio.productId, [radio]);
    }
    return products.map((p) => toSummary(p, radiosByProduct.get(p.id) ?? []));
  }

  /**
   * One product with its radios, each radio with its bands (ranges in MHz), certified gains,
   * transmit power, feed loss and polarization; used by the product page and by other domains.
   */
  async getWithRadios(id: number, manager: EntityManager = this.dataSource.manager): Promise<ProductDetailDto> {
    const product = await manager.findOne(Product, { where: { id }, relations: PEOPLE });
    if (!product) throw new NotFoundError('product', id);
    const radios = await manager.find(Radio, { where: { productId: id }, relations: { bands: { band: { ranges: true } } }, order: { id: 'ASC' } });
    return { ...toSummary(product, radios), radios: radios.map(toRadioDto) };
  }

  async create(input: CreateProductDto, actor: AuthUser): Promise<ProductDetailDto> {
    return transactionWithRetry(this.dataSource, async (manager) => {
      await this.assertCodeFree(manager, input.code);
      const simultaneousTransmit = storedSimultaneousTransmit(input.simultaneousTransmit ?? 'all');
      assertPairsOfRadios(simultaneousTransmit, []);
      const row = { ...input, notes: input.notes ?? null, simultaneousTransmit };
      const inserted = await manager.insert(Product, { ...row, createdById: actor.id });
      const id = Number(inserted.identifiers[0].id);
      await this.audit.record(manager, { entityType: 'product', entityId: id, action: 'created', userId: actor.id, changes: { ...row } });
      return this.getWithRadios(id, manager);
    });
  }

  async update(id: number, input: UpdateProductDto, actor: AuthUser): Promise<ProductDetailDto> {
    return transactionWithRetry(this.dataSource, async (manager) => {
      const before = await this.lockProduct(manager, id, input.version);
      const { version: _version, simultaneousTransmit: transmit, ...rest } = input;
      const patch: Partial<Product> = { ...rest };
      if (transmit !== undefined) {
        patch.simultaneousTransmit = storedSimultaneousTransmit(transmit);
        const radios = await manager.find(Radio, { select: { id: true }, where: { productId: id } });
        assertPairsOfRadios(
          patch.simultaneousTransmit,
          radios.map((r) => r.id),
        );
      }
      if (patch.code !== undefined && patch.code !== before.code) await this.assertCodeFree(manager, patch.code, id);
      const changes = diffFields(before, patch as Partial<Product>, PRODUCT_FIELDS);
      if (Object.keys(changes).length) {
        await manager.update(Product, { id }, { ...(patch as Partial<Product>), version: before.version + 1 });
        await this.audit.record(manager, { entityType: 'product', entityId: id, action: 'updated', userId: actor.id, changes });
      }
      return this.getWithRadios(id, manager);
    });
  }

  /**
   * A soft delete, allowed to the product's creator and to admins: the product leaves every list, matrix and
   * candidate search, but its radios and part assignments stay in place so that an admin's restore brings them back.
   */
  async remove(id: number, version: number | undefined, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const before = await this.lockProduct(manager, id, undefined);
      if (actor.role !== 'admin' && before.createdById !== actor.id) {
        throw new DomainError('PRODUCT_DELETE_FORBIDDEN', 'Only the engineer who created this product, or an admin, may delete it', 403, {
          createdById: before.createdById,
        });
      }
      if (version !== undefined && version !== before.version) throw new VersionConflictError('product', id, version, before.version);
      const radioCount = await manager.countBy(Radio, { productId: id });
      await manager.update(Product, { id }, { deletedAt: new Date(), deletedById: actor.id });
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: id,
        action: 'deleted',
        userId: actor.id,
        changes: { name: before.name, code: before.code, radioCount },
      });
    });
  }

  /** Undoes a delete (admin): the product comes back with its radios and assignments as they were. */
  async restore(id: number, actor: AuthUser): Promise<ProductDetailDto> {
    return this.dataSource.transaction(async (manager) => {
      const product = await manager.findOne(Product, { where: { id }, withDeleted: true, lock: { mode: 'pessimistic_write' } });
      if (!product) throw new NotFoundError('product', id);
      if (!product.deletedAt) throw new DomainError('PRODUCT_NOT_DELETED', `product ${id} is not deleted; there is nothing to restore`, 409);
      await manager.update(Product, { id }, { deletedAt: null, deletedById: null });
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: id,
        action: 'restored',
        userId: actor.id,
        changes: { name: product.name, code: product.code, deletedAt: product.deletedAt.toISOString(), deletedById: product.deletedById },
      });
      return this.getWithRadios(id, manager);
    });
  }

  /** The audit trail; an admin still sees it for a deleted product (who deleted it, before restoring). */
  async history(id: number, actor: AuthUser): Promise<{ items: AuditEntryView[]; total: number }> {
    const exists = await this.dataSource.getRepository(Product).exists({ where: { id }, withDeleted: actor.role === 'admin' });
    if (!exists) throw new NotFoundError('product', id);
    return this.audit.list({ entityType: 'product', entityId: id, limit: 500 });
  }

  /** 404 unless the product exists and is not deleted; for other domains' routes under /products/:id. */
  async assertExists(id: number, manager: EntityManager = this.dataSource.manager): Promise<void> {
    if (!(await manager.existsBy(Product, { id }))) throw new NotFoundError('product', id);
  }

  async listRadios(productId: number): Promise<RadioDto[]> {
    return (await this.getWithRadios(productId)).radios;
  }

  async getRadio(productId: number, radioId: number, manager: EntityManager = this.dataSource.manager): Promise<RadioDto> {
    // First, since a deleted product's radios stay in their table.
    await this.assertExists(productId, manager);
    const radio = await manager.findOne(Radio, { where: { id: radioId, productId }, relations: { bands: { band: { ranges: true } } } });
    if (!radio) throw new NotFoundError('radio', radioId);
    return toRadioDto(radio);
  }

  async createRadio(productId: number, input: CreateRadioDto, actor: AuthUser): Promise<RadioDto> {
    return this.dataSource.transaction(async (manager) => {
      // Lock the product row so a concurrent product delete cannot orphan the radio half-way.
      const product = await manager.findOne(Product, { where: { id: productId }, lock: { mode: 'pessimistic_write' } });
      if (!product) throw new NotFoundError('product', productId);
      const transmitPowerDbm = input.transmitPowerDbm ?? null;
      const gnssBandwidth = gnssBandwidthFor(input.technology, input.gnssBandwidth);
      const library = await this.checkRadio(manager, { technology: input.technology, transmitPowerDbm, gnssBandwidth, bands: input.bands });
      const { bands, ...fields } = input;
      const inserted = await manager.insert(Radio, { ...fields, transmitPowerDbm, gnssBandwidth, notes: input.notes ?? null, productId });
      const radioId = Number(inserted.identifiers[0].id);
      await this.writeRadioBands(manager, radioId, bands);
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: productId,
        action: 'radio-created',
        userId: actor.id,
        changes: {
          radioId,
          ...fields,
          transmitPowerDbm,
          gnssBandwidth,
          bands: bandsForAudit(
            bands.map((b) => ({
              designation: library.get(b.bandId)!.designation,
              certifiedMaxGainDbi: b.certifiedMaxGainDbi ?? null,
              channels: storedChannels(b.channels),
            })),
          ),
        },
      });
      return this.getRadio(productId, radioId, manager);
    });
  }

  async updateRadio(productId: number, radioId: number, input: UpdateRadioDto, actor: AuthUser): Promise<RadioDto> {
    return this.dataSource.transaction(async (manager) => {
      const before = await this.lockRadio(manager, productId, radioId, input.version);
      const { version: _version, bands, ...patch } = input;
      const beforeDto = toRadioDto(before);
      const beforeBands = beforeDto.bands.map((b) => ({ bandId: b.band.id, certifiedMaxGainDbi: b.certifiedMaxGainDbi, channels: b.channels }));
      const technology = patch.technology ?? before.technology;
      // Left out: kept for a GNSS radio (the default if it had none), cleared when the radio stops being GNSS.
      const gnssBandwidth =
        patch.gnssBandwidth !== undefined
          ? gnssBandwidthFor(technology, patch.gnssBandwidth)
          : technology === 'gnss'
            ? gnssBandwidthFor(technology, before.gnssBandwidth)
            : null;
      if (gnssBandwidth !== before.gnssBandwidth) (patch as Partial<Radio>).gnssBandwidth = gnssBandwidth;
      const merged = {
        technology,
        transmitPowerDbm: patch.transmitPowerDbm !== undefined ? patch.transmitPowerDbm : before.transmitPowerDbm,
        gnssBandwidth,
        bands: (bands ?? beforeBands) as { bandId: number; certifiedMaxGainDbi?: number | null; channels?: ChannelInput[] | null }[],
      };
      const library = await this.checkRadio(manager, merged);
      const changes: Record<string, unknown> = diffFields(before, patch as Partial<Radio>, RADIO_FIELDS);
      const nextBands = bands?.map((b) => ({ bandId: b.bandId, certifiedMaxGainDbi: b.certifiedMaxGainDbi ?? null, channels: storedChannels(b.channels) }));
      const bandsChanged = nextBands !== undefined && JSON.stringify(nextBands) !== JSON.stringify(beforeBands);
      if (bandsChanged) {
        changes.bands = [
          bandsForAudit(beforeDto.bands.map((b) => ({ designation: b.band.designation, certifiedMaxGainDbi: b.certifiedMaxGainDbi, channels: b.channels }))),
          bandsForAudit(
            nextBands.map((b) => ({ designation: library.get(b.bandId)!.designation, certifiedMaxGainDbi: b.certifiedMaxGainDbi, channels: b.channels })),
          ),
        ];
      }
      if (Object.keys(changes).length) {
        await manager.update(Radio, { id: radioId }, { ...(patch as Partial<Radio>), version: before.version + 1 });
        if (bandsChanged) {
          await manager.delete(RadioBand, { radioId });
          await this.writeRadioBands(manager, radioId, nextBands);
        }
        await this.audit.record(manager, {
          entityType: 'product',
          entityId: productId,
          action: 'radio-updated',
          userId: actor.id,
          changes: { radioId, radio: before.name, ...changes },
        });
      }
      return this.getRadio(productId, radioId, manager);
    });
  }

  async removeRadio(productId: number, radioId: number, version: number | undefined, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const before = await this.lockRadio(manager, productId, radioId, version);
      await manager.delete(Radio, { id: radioId });
      await this.audit.record(manager, {
        entityType: 'product',
        entityId: productId,
        action: 'radio-deleted',
        userId: actor.id,
        changes: { radioId, radio: before.name, technology: before.technology },
      });
    });
  }

  private async lockProduct(manager: EntityManager, id: number, expectedVersion: number | undefined): Promise<Product> {
    const product = await manager.findOne(Product, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!product) throw new NotFoundError('product', id);
    if (expectedVersion !== undefined && expectedVersion !== product.version) throw new VersionConflictError('product', id, expectedVersion, product.version);
    return product;
  }

  private async lockRadio(manager: EntityManager, productId: number, radioId: number, expectedVersion: number | undefined): Promise<Radio> {
    await this.assertExists(productId, manager);
    const locked = await manager.findOne(Radio, { where: { id: radioId, productId }, lock: { mode: 'pessimistic_write' } });
    if (!locked) throw new NotFoundError('radio', radioId);
    if (expectedVersion !== undefined && expectedVersion !== locked.version) throw new VersionConflictError('radio', radioId, expectedVersion, locked.version);
    return manager.findOneOrFail(Radio, { where: { id: radioId }, relations: { bands: { band: { ranges: true } } } });
  }

  /** Runs the cross-field radio rules against the band library; returns the bands it looked up. */
  private async checkRadio(manager: EntityManager, draft: Parameters<typeof radioProblems>[0]): Promise<Map<number, KnownBand>> {
    const ids = draft.bands.map((b) => b.bandId);
    const found = ids.length ? await manager.find(Band, { where: { id: In(ids) }, relations: { ranges: true } }) : [];
    const library = new Map<number, KnownBand>(found.map((b) => [b.id, { id: b.id, technology: b.technology, designation: b.designation, ranges: b.ranges }]));
    const problems = radioProblems(draft, library);
    if (problems.length) throw new ValidationFailedError(problems);
    return library;
  }

  private async writeRadioBands(
    manager: EntityManager,
    radioId: number,
    bands: { bandId: number; certifiedMaxGainDbi?: number | null; channels?: ChannelInput[] | null }[],
  ): Promise<void> {
    await manager.insert(
      RadioBand,
      bands.map((b, position) => ({
        radioId,
        bandId: b.bandId,
        certifiedMaxGainDbi: b.certifiedMaxGainDbi ?? null,
        channels: storedChannels(b.channels),
        position,
      })),
    );
  }

  /** A deleted product keeps its code until it is restored, so a restore never meets a duplicate. */
  private async assertCodeFree(manager: EntityManager, code: string, exceptId?: number): Promise<void> {
    const holder = await manager.findOne(Product, {
      select: { id: true, deletedAt: true },
      where: { code, ...(exceptId ? { id: Not(exceptId) } : {}) },
      withDeleted: true,
    });
    if (holder?.deletedAt) {
      throw new DomainError(
        'PRODUCT_CODE_TAKEN_BY_DELETED',
        `The deleted product ${holder.id} still has the code ${code}; choose another code or ask an admin to restore it`,
        409,
        { field: 'code', productId: holder.id },
      );
    }
    if (holder) throw new DomainError('PRODUCT_CODE_TAKEN', `Another product already has the code ${code}`, 409, { field: 'code' });
  }
}
