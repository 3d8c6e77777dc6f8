import type { Query } from '../lib/api-client';

/**
 * One key factory per server resource that more than one feature reads or changes: every feature
 * caches a resource under the same key, so one invalidation refreshes it on every page at once.
 * Resources only one feature touches (rules, users, audit, regulatory limits, rf-tools) keep their keys there.
 */

/** GET /bands (the band library), with or without a filter. */
export const bandKeys = {
  all: ['bands'] as const,
  list: (filter: Query = {}) => [...bandKeys.all, 'list', filter] as const,
};

/** GET /band-sets. */
export const bandSetKeys = {
  all: ['band-sets'] as const,
  list: () => [...bandSetKeys.all, 'list'] as const,
};

/** GET /parts (search), /parts/:id (with the coverage of chosen ranges), its history and curves. */
export const partKeys = {
  all: ['parts'] as const,
  searches: () => [...partKeys.all, 'search'] as const,
  search: (filters: Query) => [...partKeys.searches(), filters] as const,
  details: (id: number) => [...partKeys.all, 'detail', id] as const,
  detail: (id: number, ranges?: string) => [...partKeys.details(id), ranges ?? ''] as const,
  history: (id: number) => [...partKeys.all, 'history', id] as const,
  points: (id: number, measurementId: number) => [...partKeys.all, 'points', id, measurementId] as const,
  reviewQueue: () => [...partKeys.all, 'review-queue'] as const,
};

/** GET /products, /products/:id (with its radios) and its history. */
export const productKeys = {
  all: ['products'] as const,
  list: () => [...productKeys.all, 'list'] as const,
  deleted: () => [...productKeys.all, 'deleted'] as const,
  detail: (id: number) => [...productKeys.all, 'detail', id] as const,
  history: (id: number) => [...productKeys.all, 'history', id] as const,
};

/** GET /products/:id/matrix: every product's radios' bands against the catalogue. */
export const matrixKeys = {
  all: ['matrices'] as const,
  product: (productId: number) => [...matrixKeys.all, productId] as const,
};

/** GET /products/:id/radios/:radioId/candidates: the parts ranked for one radio. */
export const candidateKeys = {
  all: ['candidates'] as const,
  product: (productId: number) => [...candidateKeys.all, productId] as const,
  radio: (productId: number, radioId: number) => [...candidateKeys.product(productId), radioId] as const,
};
