import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError, NotFoundError, ValidationFailedError, VersionConflictError } from '../../common/domain-error';
import { AuditService, diffFields } from '../../audit/audit.service';
import { PartAlternate } from './alternate.entity';
import { touchPart } from '../catalogue-revision';
import { type PriceBreak, PartOffer } from './offer.entity';
import { offerDto, PartsService } from '../catalogue/parts.service';
import type { AlternateInputDto, CreateOfferDto, PriceBreakInputDto, UpdateOfferDto } from '../dto/sourcing.dto';
import type { OfferDto } from '../dto/part-response.dto';

/** Sorted by quantity, duplicates refused, the lowest price kept as a decimal string for the price filter. */
export function normalisePriceBreaks(breaks: PriceBreakInputDto[]): { priceBreaks: PriceBreak[]; minUnitPrice: string } {
  const sorted = [...breaks].sort((a, b) => a.quantity - b.quantity);
  const problems = sorted.flatMap((b, i) =>
    i > 0 && b.quantity === sorted[i - 1].quantity ? [{ field: 'priceBreaks', message: `quantity ${b.quantity} appears twice` }] : [],
  );
  if (problems.length) throw new ValidationFailedError(problems);
  // Compare as scaled integers (ten-thousandths) so money never goes through binary fractions.
  const scaled = (price: string) => {
    const [whole, fraction = ''] = price.split('.');
    return BigInt(whole) * 10000n + BigInt((fraction + '0000').slice(0, 4));
  };
  const min = sorted.reduce((best, b) => (scaled(b.unitPrice) < scaled(best.unitPrice) ? b : best));
  const minScaled = scaled(min.unitPrice);
  const minUnitPrice = `${minScaled / 10000n}.${String(minScaled % 10000n).padStart(4, '0')}`;
  return { priceBreaks: sorted.map((b) => ({ quantity: b.quantity, unitPrice: b.unitPrice })), minUnitPrice };
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
      for (const field of ['supplier', 'sku', 'currency', 'moq', 'leadTimeDays', 'lastCheckedOn'] as const) {
        if (input[field] !== undefined) (changes as Record<string, unknown>)[field] = input[field];
      }
      if (changes.supplier === null || changes.currency === null)
        throw new ValidationFailedError([{ field: changes.supplier === null ? 'supplier' : 'currency', message: 'cannot be cleared' }]);
      if (input.priceBreaks) Object.assign(changes, normalisePriceBreaks(input.priceBreaks));
      const diff = diffFields(offer, changes, ['supplier', 'sku', 'currency', 'priceBreaks', 'moq', 'leadTimeDays', 'lastCheckedOn']);
      await manager.update(PartOffer, { id: offerId }, { ...changes, version: offer.version + 1 });
      await touchPart(manager, partId);
      await this.audit.record(manager, { entityType: 'part', entityId: partId, action: 'offer-updated', userId: actor.id, changes: { offerId, ...diff } });
    });
    return offerDto(await this.dataSource.getRepository(PartOffer).findOneByOrFail({ id: offerId }));
  }

  async removeOffer(partId: number, offerId: number, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await this.parts.lockPart(manager, partId);
      const offer = await manager.findOneBy(PartOffer, { id: offerId, partId });
      if (!offer) throw new NotFoundError('offer', offerId);
      await manager.delete(PartOffer, { id: offerId });
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'offer-removed',
        userId: actor.id,
        changes: { offerId, supplier: offer.supplier },
      });
    });
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
