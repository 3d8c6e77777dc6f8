import type { QueryClient } from '@tanstack/react-query';
import { bandSetKeys, candidateKeys, inProductKeys, matrixKeys, partKeys, productKeys, regulatoryLimitKeys, ruleKeys, userKeys } from './query-keys';

/**
 * What a write changes, in one place: each mutation calls the function for the resource it wrote,
 * which marks stale every cached resource computed from it (the matrix and candidates included),
 * so that the page in view refetches at once instead of after the 30 s stale time.
 */

const invalidateAll = (queryClient: QueryClient, keys: readonly (readonly unknown[])[]) =>
  Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));

/** A product's own fields (name, ground plane…), its deletion or restoration: lists, the product and its verdicts. */
export const invalidateProduct = (queryClient: QueryClient, productId?: number) =>
  invalidateAll(queryClient, productId === undefined ? [productKeys.all] : [productKeys.all, matrixKeys.product(productId), candidateKeys.product(productId)]);

/**
 * A radio added, edited or removed: its product (radios, history, list counts), the product's matrix and candidates,
 * and its in-product port mapping and isolation (a radio's name and bands label them; removing it unmaps its ports).
 */
export const invalidateRadio = (queryClient: QueryClient, productId: number) =>
  invalidateAll(queryClient, [
    productKeys.detail(productId),
    productKeys.history(productId),
    productKeys.list(),
    matrixKeys.product(productId),
    candidateKeys.product(productId),
    inProductKeys.product(productId),
  ]);

/**
 * An in-product measurement uploaded, mapped or deleted: the files and isolation, the product's history, and its
 * verdicts (a mapped port's S11 replaces the chosen part's evaluation-board S11; isolation feeds coexistence).
 */
export const invalidateInProduct = (queryClient: QueryClient, productId: number) =>
  invalidateAll(queryClient, [inProductKeys.product(productId), productKeys.history(productId), matrixKeys.product(productId)]);

/** A part created, edited, reviewed, measured or documented: the part, searches, the queue and every verdict. */
export const invalidatePart = (queryClient: QueryClient, partId?: number) =>
  invalidateAll(queryClient, [
    ...(partId === undefined ? [] : [partKeys.details(partId), partKeys.history(partId), partKeys.consistency(partId)]),
    partKeys.searches(),
    partKeys.reviewQueue(),
    matrixKeys.all,
    candidateKeys.all,
  ]);

/** A part shortlisted, chosen or removed for a radio: the product's matrix columns and candidates' tags. */
export const invalidateAssignment = (queryClient: QueryClient, productId: number) =>
  invalidateAll(queryClient, [matrixKeys.product(productId), candidateKeys.product(productId)]);

/** Every verdict: every matrix and candidate list. */
export const invalidateVerdicts = (queryClient: QueryClient) => invalidateAll(queryClient, [matrixKeys.all, candidateKeys.all]);

/** A rule created, edited, switched on or off: the rules and every verdict. */
export const invalidateRules = (queryClient: QueryClient) => invalidateAll(queryClient, [ruleKeys.all, matrixKeys.all, candidateKeys.all]);

/** A regulatory limit created, corrected or deleted: the limits, and every verdict (the EIRP rules compare against them). */
export const invalidateRegulatoryLimits = (queryClient: QueryClient) =>
  invalidateAll(queryClient, [regulatoryLimitKeys.all, matrixKeys.all, candidateKeys.all]);

/** A user invited, given another role, deactivated or reactivated. */
export const invalidateUsers = (queryClient: QueryClient) => invalidateAll(queryClient, [userKeys.all]);

/** A band set created, edited or deleted. */
export const invalidateBandSets = (queryClient: QueryClient) => invalidateAll(queryClient, [bandSetKeys.all]);
