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

/** The page-address parameters that keep the open candidates list and its filters over a reload, Back and a shared link. */
export const CANDIDATE_PARAMS = {
  radio: 'candidates',
  formFactor: 'candidateFormFactor',
  feed: 'candidateFeed',
  maxPrice: 'candidateMaxPrice',
  maxLeadTimeDays: 'candidateMaxLeadDays',
  quantity: 'candidateQuantity',
  currency: 'candidateCurrency',
} as const;

const listOf = (value: string | null) => (value ? value.split(',').filter(Boolean) : []);

/** The filters kept in the address; anything missing or unreadable falls back to no filter. */
export function filtersFromParams(params: URLSearchParams): CandidateFilters {
  const quantity = Number(params.get(CANDIDATE_PARAMS.quantity));
  return {
    formFactor: listOf(params.get(CANDIDATE_PARAMS.formFactor)) as FormFactor[],
    feed: listOf(params.get(CANDIDATE_PARAMS.feed)) as Connector[],
    maxPrice: params.get(CANDIDATE_PARAMS.maxPrice) ?? '',
    maxLeadTimeDays: params.get(CANDIDATE_PARAMS.maxLeadTimeDays) ?? '',
    quantity: Number.isInteger(quantity) && quantity >= 1 ? quantity : NO_FILTERS.quantity,
    currency: params.get(CANDIDATE_PARAMS.currency) || NO_FILTERS.currency,
  };
}

/** Writes the filters into a copy of the address parameters, leaving out what equals no filter. */
export function withFilterParams(params: URLSearchParams, filters: CandidateFilters): URLSearchParams {
  const next = new URLSearchParams(params);
  const put = (key: string, value: string, empty: string) => (value === empty ? next.delete(key) : next.set(key, value));
  put(CANDIDATE_PARAMS.formFactor, filters.formFactor.join(','), '');
  put(CANDIDATE_PARAMS.feed, filters.feed.join(','), '');
  put(CANDIDATE_PARAMS.maxPrice, filters.maxPrice, '');
  put(CANDIDATE_PARAMS.maxLeadTimeDays, filters.maxLeadTimeDays, '');
  put(CANDIDATE_PARAMS.quantity, String(filters.quantity), String(NO_FILTERS.quantity));
  put(CANDIDATE_PARAMS.currency, filters.currency, NO_FILTERS.currency);
  return next;
}

/** Closing the list forgets its radio and filters. */
export function withoutCandidateParams(params: URLSearchParams): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const key of Object.values(CANDIDATE_PARAMS)) next.delete(key);
  return next;
}

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
