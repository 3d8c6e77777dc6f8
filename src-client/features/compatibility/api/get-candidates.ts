import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { candidateKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { CandidateQuery, Candidates } from '../types';

export const getCandidates = (productId: number, radioId: number, query: CandidateQuery) =>
  apiRequest<Candidates>(`/products/${productId}/radios/${radioId}/candidates`, { query });

export const getCandidatesQueryOptions = (productId: number, radioId: number, query: CandidateQuery) =>
  queryOptions({ queryKey: candidateKeys.filtered(productId, radioId, query), queryFn: () => getCandidates(productId, radioId, query) });

/** Keeps the last list on screen while a changed filter loads. */
export const useCandidates = (productId: number, radioId: number | null, query: CandidateQuery = {}) =>
  useQuery({ ...getCandidatesQueryOptions(productId, radioId ?? 0, query), enabled: radioId !== null, placeholderData: keepPreviousData });
