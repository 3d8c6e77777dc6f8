import { useQuery } from '@tanstack/react-query';
import { getReviewQueue, getReviewQueueQueryOptions } from '../../../api/review-queue';

export { getReviewQueue, getReviewQueueQueryOptions };

export const useReviewQueue = () => useQuery(getReviewQueueQueryOptions());
