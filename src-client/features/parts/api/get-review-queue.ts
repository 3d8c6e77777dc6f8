import { queryOptions, useQuery } from '@tanstack/react-query';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ReviewQueueItem } from '../types';

export const getReviewQueue = () => apiRequest<ReviewQueueItem[]>('/parts/review-queue');

export const getReviewQueueQueryOptions = () => queryOptions({ queryKey: partKeys.reviewQueue(), queryFn: getReviewQueue });

export const useReviewQueue = () => useQuery(getReviewQueueQueryOptions());
