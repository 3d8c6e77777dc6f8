import type { Candidate, CandidateFilters, CandidateQuery, Connector, FormFactor } from '../types';

export const FORM_FACTOR_WORDS: Record<FormFactor, string> = {
  chip: 'Chip',
  'pcb-trace': 'PCB trace',
  flex: 'Flex',
  'stamped-metal': 'Stamped metal',
  patch: 'Patch',
  'external-whip': 'External whip',
  panel: 'Panel',
};

export const FEED_WORDS: Record<Connector, string> = {
  'solder-pad': 'Solder pad',
  SMA: 'SMA',
  'RP-SMA': 'RP-SMA',
  MMCX: 'MMCX',
  MCX: 'MCX',
  N: 'N',
  'micro-coax': 'Micro-coax',
};

/** How the part's feed meets the radio's, in words. */
export function feedFitText(fit: Candidate['fit']['feed'], radioFeed: Connector, partFeed: Connector): string {
  if (fit === 'direct') return `${FEED_WORDS[partFeed]}: fits the radio's feed`;
  if (fit === 'adapter') return `${FEED_WORDS[partFeed]}: needs an adapter or cable to the radio's ${FEED_WORDS[radioFeed]}`;
  return `${FEED_WORDS[partFeed]}: needs a board change for the radio's ${FEED_WORDS[radioFeed]}`;
}

export const POLARIZATION_FIT_WORDS: Record<Candidate['fit']['polarization'], string> = {
  matched: 'Polarization matches',
  loss: 'Linear against circular polarization: about 3 dB lost',
  opposite: 'Opposite circular polarization',
  unknown: 'Polarization not stated',
};

/** "0.4211 USD each at 100 pcs" with the break it comes from, or that no offer supplies the quantity. */
export function priceText(price: Candidate['price'], quantity: number): string {
  if (!price) return `No offer for ${quantity} pcs`;
  return `${price.unitPrice} ${price.currency} each at ${quantity} pcs (price break ${price.breakQuantity} pcs, ${price.supplier})`;
}

export function leadTimeText(price: Candidate['price']): string {
  if (!price) return '';
  return price.leadTimeDays === null || price.leadTimeDays === undefined ? 'Lead time not stated' : `Lead time ${price.leadTimeDays} days`;
}

export const NO_FILTERS: CandidateFilters = { formFactor: [], feed: [], maxPrice: '', maxLeadTimeDays: '', quantity: 1, currency: 'USD' };

/** The filters as the server reads them; an empty or half-typed limit is left out rather than sent. */
export function candidateQuery(filters: CandidateFilters, limit: number): CandidateQuery {
  const maxPrice = /^\d{1,10}(?:\.\d{1,4})?$/.test(filters.maxPrice.trim()) ? filters.maxPrice.trim() : undefined;
  const lead = /^\d{1,4}$/.test(filters.maxLeadTimeDays.trim()) ? Number(filters.maxLeadTimeDays.trim()) : undefined;
  return {
    limit,
    formFactor: filters.formFactor.length ? filters.formFactor.join(',') : undefined,
    feed: filters.feed.length ? filters.feed.join(',') : undefined,
    maxPrice,
    maxLeadTimeDays: lead !== undefined && lead <= 3650 ? lead : undefined,
    quantity: Number.isInteger(filters.quantity) && filters.quantity >= 1 ? filters.quantity : 1,
    currency: filters.currency,
  };
}
