/**
 * Prices of supplier offers at a build quantity, in exact decimal arithmetic (ten-thousandths as integers):
 * money never goes through binary fractions. Pure: no Nest, no database.
 */

export interface PriceBreakInput {
  readonly quantity: number;
  /** Decimal string with up to 4 decimals, as stored. */
  readonly unitPrice: string;
}

export interface OfferInput {
  readonly offerId: number;
  readonly partId: number;
  readonly supplier: string;
  readonly currency: string;
  readonly priceBreaks: readonly PriceBreakInput[];
  readonly moq: number | null;
  readonly leadTimeDays: number | null;
}

export interface PricedOffer {
  readonly offerId: number;
  readonly supplier: string;
  readonly currency: string;
  /** The quantity of the break that applies (the largest break at or below the quantity bought). */
  readonly breakQuantity: number;
  readonly unitPrice: string;
  readonly leadTimeDays: number | null;
  readonly moq: number | null;
}

const SCALE = 10000n;

/** "0.4200" → 4200n (ten-thousandths). */
export function toScaled(price: string): bigint {
  const [whole, fraction = ''] = price.split('.');
  return BigInt(whole) * SCALE + BigInt((fraction + '0000').slice(0, 4));
}

/** 4200n → "0.4200". */
export function fromScaled(value: bigint): string {
  return `${value / SCALE}.${String(value % SCALE).padStart(4, '0')}`;
}

/**
 * The offer's price when `quantity` pieces are bought: the break with the largest quantity not above it.
 * Null when the offer cannot sell that few (below its minimum order or its first break).
 */
export function priceAtQuantity(offer: OfferInput, quantity: number): PricedOffer | null {
  if (offer.moq !== null && quantity < offer.moq) return null;
  let applicable: PriceBreakInput | null = null;
  for (const b of offer.priceBreaks) if (b.quantity <= quantity && (applicable === null || b.quantity > applicable.quantity)) applicable = b;
  if (applicable === null) return null;
  return {
    offerId: offer.offerId,
    supplier: offer.supplier,
    currency: offer.currency,
    breakQuantity: applicable.quantity,
    unitPrice: fromScaled(toScaled(applicable.unitPrice)),
    leadTimeDays: offer.leadTimeDays,
    moq: offer.moq,
  };
}

export interface OfferLimits {
  /** Highest unit price, in `currency`: offers in other currencies cannot meet it. */
  readonly maxUnitPrice?: string;
  readonly maxLeadTimeDays?: number;
}

/**
 * The offer to buy a part from at `quantity`: the cheapest usable offer in the preferred currency, else the
 * cheapest usable one in any other (alphabetical by currency, as prices in two currencies do not compare);
 * ties go to the shorter lead time. Limits leave out offers that exceed them. Null when no offer can supply it.
 */
export function bestOffer(offers: readonly OfferInput[], quantity: number, currency: string, limits: OfferLimits = {}): PricedOffer | null {
  const max = limits.maxUnitPrice !== undefined ? toScaled(limits.maxUnitPrice) : null;
  const usable = offers
    .map((o) => priceAtQuantity(o, quantity))
    .filter((p): p is PricedOffer => p !== null)
    .filter((p) => limits.maxLeadTimeDays === undefined || (p.leadTimeDays !== null && p.leadTimeDays <= limits.maxLeadTimeDays))
    .filter((p) => max === null || (p.currency === currency && toScaled(p.unitPrice) <= max));
  let best: PricedOffer | null = null;
  for (const p of usable) {
    if (best === null) {
      best = p;
      continue;
    }
    const preferred = (x: PricedOffer) => (x.currency === currency ? 0 : 1);
    const order =
      preferred(p) - preferred(best) ||
      (p.currency === best.currency ? 0 : p.currency < best.currency ? -1 : 1) ||
      (toScaled(p.unitPrice) < toScaled(best.unitPrice) ? -1 : toScaled(p.unitPrice) > toScaled(best.unitPrice) ? 1 : 0) ||
      (p.leadTimeDays ?? Infinity) - (best.leadTimeDays ?? Infinity);
    if (order < 0) best = p;
  }
  return best;
}

/** Sums of decimal amounts per currency, each amount times its count. */
export function totalsByCurrency(lines: readonly { readonly currency: string; readonly unitPrice: string; readonly count: number }[]): {
  currency: string;
  total: string;
}[] {
  const sums = new Map<string, bigint>();
  for (const line of lines) sums.set(line.currency, (sums.get(line.currency) ?? 0n) + toScaled(line.unitPrice) * BigInt(line.count));
  return [...sums.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([currency, total]) => ({ currency, total: fromScaled(total) }));
}
