import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { RevisionCache } from '../../common/revision-cache';
import type { OfferInput, PriceBreakInput } from './price-at-quantity';

interface OfferRow {
  id: number;
  part_id: number;
  supplier: string;
  currency: string;
  price_breaks: string | PriceBreakInput[];
  moq: number | null;
  lead_time_days: number | null;
}

const toOffer = (r: OfferRow): OfferInput => ({
  offerId: r.id,
  partId: r.part_id,
  supplier: r.supplier,
  currency: r.currency,
  priceBreaks: typeof r.price_breaks === 'string' ? JSON.parse(r.price_breaks) : r.price_breaks,
  moq: r.moq,
  leadTimeDays: r.lead_time_days,
});

function byPart(offers: readonly OfferInput[]): Map<number, OfferInput[]> {
  const map = new Map<number, OfferInput[]>();
  for (const o of offers) (map.get(o.partId) ?? map.set(o.partId, []).get(o.partId)!).push(o);
  return map;
}

/** Supplier offers as the candidates and the bill of materials read them (an offer change moves the catalogue revision). */
@Injectable()
export class OffersReader {
  /** Offers of every part, by part: one query per catalogue revision. */
  private readonly all = new RevisionCache<Map<number, OfferInput[]>>(1);

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  private async load(where: string, params: unknown[]): Promise<OfferInput[]> {
    const rows: OfferRow[] = await this.dataSource.query(
      `SELECT id, part_id, supplier, currency, price_breaks, moq, lead_time_days FROM part_offers ${where} ORDER BY part_id, id`,
      params,
    );
    return rows.map(toOffer);
  }

  /** Every offer, by part, read after `revision` was. */
  allAt(revision: number): Promise<Map<number, OfferInput[]>> {
    return this.all.getOrLoad('offers', revision, async () => byPart(await this.load('', [])));
  }

  async forParts(partIds: readonly number[]): Promise<Map<number, OfferInput[]>> {
    if (partIds.length === 0) return new Map();
    return byPart(await this.load('WHERE part_id IN (?)', [[...new Set(partIds)]]));
  }
}
