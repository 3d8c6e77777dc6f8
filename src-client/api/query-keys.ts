import type { Query } from '../lib/api-client';
import type { components, operations } from '../lib/api-types';

type Schemas = components['schemas'];

/**
 * One key factory per server resource, for every feature: each resource is cached under one key, so one
 * invalidation (invalidation.ts) refreshes it on every page at once.
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
  consistency: (id: number) => [...partKeys.all, 'consistency', id] as const,
  offerRemovals: (id: number) => [...partKeys.all, 'offer-removals', id] as const,
};

/** GET /products, /products/:id (with its radios) and its history. */
export const productKeys = {
  all: ['products'] as const,
  list: () => [...productKeys.all, 'list'] as const,
  deleted: () => [...productKeys.all, 'deleted'] as const,
  detail: (id: number) => [...productKeys.all, 'detail', id] as const,
  history: (id: number) => [...productKeys.all, 'history', id] as const,
};

/**
 * GET /products/:id/matrix, and what is computed from the same verdicts and choices: the evaluation and the bill
 * of materials sit under the product's key, so every invalidation of a product's matrix refreshes them too.
 */
export const matrixKeys = {
  all: ['matrices'] as const,
  product: (productId: number) => [...matrixKeys.all, productId] as const,
  view: (productId: number, chosenOnly: boolean) => [...matrixKeys.product(productId), 'matrix', chosenOnly ? 'chosen' : 'assigned'] as const,
  evaluation: (productId: number) => [...matrixKeys.product(productId), 'evaluation'] as const,
  billOfMaterials: (productId: number, quantity: number) => [...matrixKeys.product(productId), 'bill-of-materials', quantity] as const,
};

/**
 * GET /products/:id/in-product-measurements and /products/:id/isolation: the product's files measured in its own
 * enclosure, their port mapping, and the isolation and envelope correlation between the mapped antennas.
 */
export const inProductKeys = {
  all: ['in-product'] as const,
  product: (productId: number) => [...inProductKeys.all, productId] as const,
  list: (productId: number) => [...inProductKeys.product(productId), 'list'] as const,
  isolation: (productId: number) => [...inProductKeys.product(productId), 'isolation'] as const,
};

/** GET /products/:id/radios/:radioId/candidates: the parts ranked for one radio. */
export const candidateKeys = {
  all: ['candidates'] as const,
  product: (productId: number) => [...candidateKeys.all, productId] as const,
  radio: (productId: number, radioId: number) => [...candidateKeys.product(productId), radioId] as const,
  filtered: (productId: number, radioId: number, filters: Query) => [...candidateKeys.radio(productId, radioId), filters] as const,
};

/** GET /regulatory-limits: the published power limits the matrix's EIRP rules compare against. */
export const regulatoryLimitKeys = {
  all: ['regulatory-limits'] as const,
  list: () => [...regulatoryLimitKeys.all, 'list'] as const,
};

/** GET /rules, /rules/:id and its versions. */
export const ruleKeys = {
  all: ['rules'] as const,
  list: () => [...ruleKeys.all, 'list'] as const,
  detail: (id: string) => [...ruleKeys.all, 'detail', id] as const,
  versions: (id: string) => [...ruleKeys.all, 'versions', id] as const,
};

/** GET /users. */
export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

/** GET /audit, one page of it. */
export const auditKeys = {
  all: ['audit'] as const,
  list: (filter: NonNullable<operations['AuditController_list']['parameters']['query']>) => [...auditKeys.all, 'list', filter] as const,
};

/** POST /rf/…: the calculators are pure computations, so an answer is cached by its input for good. */
export const rfToolKeys = {
  all: ['rf-tools'] as const,
  conversion: (input: Schemas['ConversionRequestDto']) => [...rfToolKeys.all, 'conversion', input] as const,
  linkBudget: (input: Schemas['LinkBudgetRequestDto']) => [...rfToolKeys.all, 'link-budget', input] as const,
  matching: (input: Schemas['MatchingRequestDto']) => [...rfToolKeys.all, 'matching', input] as const,
};
