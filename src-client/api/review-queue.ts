import { queryOptions, useQuery } from '@tanstack/react-query';
import type { components } from '../lib/api-types';
import { apiRequest } from '../lib/api-client';
import { partKeys } from './query-keys';

type ReviewQueueItem = components['schemas']['ReviewQueueItemDto'];

/** GET /parts/review-queue: the review page lists it, the navigation rail counts it (admins only). */
export const getReviewQueue = () => apiRequest<ReviewQueueItem[]>('/parts/review-queue');

export const getReviewQueueQueryOptions = () => queryOptions({ queryKey: partKeys.reviewQueue(), queryFn: getReviewQueue });

/** How many parts wait for review; undefined until known or when not asked (`enabled` false for other roles). */
export const useReviewQueueCount = (enabled: boolean) => useQuery({ ...getReviewQueueQueryOptions(), enabled, select: (items) => items.length }).data;
