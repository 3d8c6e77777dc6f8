import { queryOptions, useQuery } from '@tanstack/react-query';
import { rfToolKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { MatchingRequest, MatchingResponse } from '../types';

export const designMatch = (input: MatchingRequest) => apiRequest<MatchingResponse>('/rf/matching', { method: 'POST', body: input });

export const getMatchingQueryOptions = (input: MatchingRequest) =>
  queryOptions({ queryKey: rfToolKeys.matching(input), queryFn: () => designMatch(input), staleTime: Infinity, retry: false });

/** Runs for the request last submitted (null until the first). */
export const useMatching = (input: MatchingRequest | null) => useQuery({ ...getMatchingQueryOptions(input!), enabled: input !== null });
