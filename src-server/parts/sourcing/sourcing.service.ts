import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager, MoreThanOrEqual } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError, NotFoundError, ValidationFailedError, VersionConflictError } from '../../common/domain-error';
import { AuditService, diffFields } from '../../audit/audit.service';
import { PartAlternate } from './alternate.entity';
import { touchPart } from '../catalogue-revision';
import { type PriceBreak, PartOffer, PartOfferRemoval } from './offer.entity';
import { Part } from '../part.entity';
import { fromScaled, toScaled } from '../../compatibility/sourcing/price-at-quantity';
import { offerDto, PartsService } from '../catalogue/parts.service';
import type { AlternateInputDto, CreateOfferDto, PriceBreakInputDto, UpdateOfferDto } from '../dto/sourcing.dto';
import type { OfferDto, OfferRemovalDto } from '../dto/part-response.dto';

/** How long a removed offer can be put back. */
export const OFFER_UNDO_SECONDS = 30;

/** The offer fields the audit log records, before and after, in the order the history lists them. */
const OFFER_FIELDS = ['supplier', 'sku', 'currency', 'priceBreaks', 'moq', 'stock', 'leadTimeDays', 'lastCheckedOn'] as const;

/** Sorted by quantity, duplicates refused (naming the break as sent), the lowest price kept as a decimal string for the price filter. */
export function normalisePriceBreaks(breaks: PriceBreakInputDto[]): { priceBreaks: PriceBreak[]; minUnitPrice: string } {
  const seen = new Map<number, number>();
  const problems = breaks.flatMap((b, i) => {
    const first = seen.get(b.quantity);
    if (first === undefined) {
      seen.set(b.quantity, i);
      return [];
    }
    return [{ field: `priceBreaks.${i}.quantity`, message: `quantity ${b.quantity} is already the quantity of break ${first + 1}` }];
  });
  if (problems.length) throw new ValidationFailedError(problems);
  const sorted = [...breaks].sort((a, b) => a.quantity - b.quantity);
  const min = sorted.reduce((best, b) => (toScaled(b.unitPrice) < toScaled(best.unitPrice) ? b : best));
  return { priceBreaks: sorted.map((b) => ({ quantity: b.quantity, unitPrice: b.unitPrice })), minUnitPrice: fromScaled(toScaled(min.unitPrice)) };
}

@Injectable()
export class SourcingService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly parts: PartsService,
    private readonly audit: AuditService,
  ) {}

  async createOfferIn(manager: EntityManager, partId: number, input: CreateOfferDto, actorId: number | null): Promise<number> {
    await this.parts.lockPart(manager, partId);
    const { priceBreaks, minUnitPrice } = normalisePriceBreaks(input.priceBreaks);
    const fields = {
      supplier: input.supplier.trim(),
      sku: input.sku ?? null,
      currency: input.currency,
      priceBreaks,
      minUnitPrice,
      moq: input.moq ?? null,
      stock: input.stock ?? null,
      leadTimeDays: input.leadTimeDays ?? null,
      lastCheckedOn: input.lastCheckedOn ?? null,
    };
    const inserted = await manager.insert(PartOffer, { partId, ...fields, version: 1 });
    const offerId: number = inserted.identifiers[0].id;
    await touchPart(manager, partId);
    await this.audit.record(manager, { entityType: 'part', entityId: partId, action: 'offer-added', userId: actorId, changes: { offerId, ...fields } });
    return offerId;
  }

  async createOffer(partId: number, input: CreateOfferDto, actor: AuthUser): Promise<OfferDto> {
    const id = await this.dataSource.transaction((manager) => this.createOfferIn(manager, partId, input, actor.id));
    return offerDto(await this.dataSource.getRepository(PartOffer).findOneByOrFail({ id }));
  }

  async updateOffer(partId: number, offerId: number, input: UpdateOfferDto, actor: AuthUser): Promise<OfferDto> {
    await this.dataSource.transaction(async (manager) => {
      await this.parts.lockPart(manager, partId);
      const offer = await manager.findOne(PartOffer, { where: { id: offerId, partId }, lock: { mode: 'pessimistic_write' } });
      if (!offer) throw new NotFoundError('offer', offerId);
      if (offer.version !== input.version) throw new VersionConflictError('offer', offerId, input.version, offer.version);
      const changes: Partial<PartOffer> = {};
      for (const field of ['supplier', 'sku', 'currency', 'moq', 'stock', 'leadTimeDays', 'lastCheckedOn'] as const) {
        if (input[field] !== undefined) (changes as Record<string, unknown>)[field] = input[field];
      }
      if (changes.supplier === null || changes.currency === null)
        throw new ValidationFailedError([{ field: changes.supplier === null ? 'supplier' : 'currency', message: 'cannot be cleared' }]);
      if (typeof changes.supplier === 'string') changes.supplier = changes.supplier.trim();
      if (input.priceBreaks) Object.assign(changes, normalisePriceBreaks(input.priceBreaks));
      // Each changed field as [before, after], so the history shows the values, not only the names.
      const diff = diffFields(offer, changes, [...OFFER_FIELDS]);
      await manager.update(PartOffer, { id: offerId }, { ...changes, version: offer.version + 1 });
      await touchPart(manager, partId);
      await this.audit.record(manager, { entityType: 'part', entityId: partId, action: 'offer-updated', userId: actor.id, changes: { offerId, ...diff } });
    });
    return offerDto(await this.dataSource.getRepository(PartOffer).findOneByOrFail({ id: offerId }));
  }

  /** Removes the offer and keeps it whole for OFFER_UNDO_SECONDS, so a mistaken removal can be put back (even after a reload). */
  async removeOffer(partId: number, offerId: number, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await this.parts.lockPart(manager, partId);
      const offer = await manager.findOneBy(PartOffer, { id: offerId, partId });
      if (!offer) throw new NotFoundError('offer', offerId);
      await this.forgetExpiredRemovals(manager);
      const { part: _part, ...row } = offer;
      const removal: PartOfferRemoval = { offerId, partId, offer: { ...row }, removedById: actor.id, removedAt: new Date() };
      await manager.insert(PartOfferRemoval, removal as never);
      await manager.delete(PartOffer, { id: offerId });
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'offer-removed',
        userId: actor.id,
        changes: { offerId, ...Object.fromEntries(OFFER_FIELDS.map((f) => [f, offer[f]])) },
      });
    });
  }

  private async forgetExpiredRemovals(manager: EntityManager): Promise<void> {
    await manager
      .createQueryBuilder()
      .delete()
      .from(PartOfferRemoval)
      .where('removed_at < :cutoff', { cutoff: new Date(Date.now() - OFFER_UNDO_SECONDS * 1000) })
      .execute();
  }

  /** Offers of the part removed within the undo window, newest first. */
  async recentRemovals(partId: number): Promise<OfferRemovalDto[]> {
    if (!(await this.dataSource.getRepository(Part).existsBy({ id: partId }))) throw new NotFoundError('part', partId);
    const since = new Date(Date.now() - OFFER_UNDO_SECONDS * 1000);
    const rows = await this.dataSource
      .getRepository(PartOfferRemoval)
      .find({ where: { partId, removedAt: MoreThanOrEqual(since) }, order: { removedAt: 'DESC' } });
    return rows.map((r) => ({
      offerId: r.offerId,
      supplier: String(r.offer.supplier),
      removedAt: r.removedAt.toISOString(),
      undoUntil: new Date(r.removedAt.getTime() + OFFER_UNDO_SECONDS * 1000).toISOString(),
    }));
  }

  /** Puts a removed offer back under its id, as it was; 410 OFFER_UNDO_EXPIRED once the window has passed. */
  async restoreOffer(partId: number, offerId: number, actor: AuthUser): Promise<OfferDto> {
    await this.dataSource.transaction(async (manager) => {
      await this.parts.lockPart(manager, partId);
      const removal = await manager.findOne(PartOfferRemoval, { where: { offerId, partId }, lock: { mode: 'pessimistic_write' } });
      if (!removal) throw new NotFoundError('offer removal', offerId);
      if (Date.now() - removal.removedAt.getTime() > OFFER_UNDO_SECONDS * 1000) {
        throw new DomainError('OFFER_UNDO_EXPIRED', `The removal of offer ${offerId} can no longer be undone (${OFFER_UNDO_SECONDS} s have passed)`, 410, {
          offerId,
          undoSeconds: OFFER_UNDO_SECONDS,
        });
      }
      const row = removal.offer as unknown as PartOffer;
      const fields = Object.fromEntries(OFFER_FIELDS.map((f) => [f, row[f] ?? null]));
      await manager.insert(PartOffer, { ...fields, id: offerId, partId, minUnitPrice: row.minUnitPrice, version: row.version + 1 });
      await manager.delete(PartOfferRemoval, { offerId });
      await touchPart(manager, partId);
      await this.audit.record(manager, { entityType: 'part', entityId: partId, action: 'offer-restored', userId: actor.id, changes: { offerId, ...fields } });
    });
    return offerDto(await this.dataSource.getRepository(PartOffer).findOneByOrFail({ id: offerId }));
  }

  /** Links both ways, so each part lists the other. */
  async linkIn(manager: EntityManager, partId: number, otherId: number, input: AlternateInputDto, actorId: number | null): Promise<void> {
    if (partId === otherId) throw new DomainError('ALTERNATE_SELF', 'A part cannot be its own alternate', 400);
    // Lock in id order so two opposite links cannot deadlock.
    for (const id of [partId, otherId].sort((a, b) => a - b)) await this.parts.lockPart(manager, id);
    const note = input.note?.trim() || null;
    await manager.upsert(
      PartAlternate,
      [
        { partId, alternatePartId: otherId, kind: input.kind, note },
        { partId: otherId, alternatePartId: partId, kind: input.kind, note },
      ],
      ['partId', 'alternatePartId'],
    );
    for (const id of [partId, otherId]) await touchPart(manager, id);
    await this.audit.record(manager, {
      entityType: 'part',
      entityId: partId,
      action: 'alternate-linked',
      userId: actorId,
      changes: { alternatePartId: otherId, kind: input.kind, note },
    });
    await this.audit.record(manager, {
      entityType: 'part',
      entityId: otherId,
      action: 'alternate-linked',
      userId: actorId,
      changes: { alternatePartId: partId, kind: input.kind, note },
    });
  }

  async link(partId: number, otherId: number, input: AlternateInputDto, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction((manager) => this.linkIn(manager, partId, otherId, input, actor.id));
  }

  async unlink(partId: number, otherId: number, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      for (const id of [partId, otherId].sort((a, b) => a - b)) await this.parts.lockPart(manager, id);
      const forward = await manager.delete(PartAlternate, { partId, alternatePartId: otherId });
      await manager.delete(PartAlternate, { partId: otherId, alternatePartId: partId });
      if (!forward.affected) throw new NotFoundError('alternate link', `${partId}-${otherId}`);
      for (const id of [partId, otherId]) await touchPart(manager, id);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'alternate-unlinked',
        userId: actor.id,
        changes: { alternatePartId: otherId },
      });
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: otherId,
        action: 'alternate-unlinked',
        userId: actor.id,
        changes: { alternatePartId: partId },
      });
    });
  }
}
