import { queryOptions, useQuery } from '@tanstack/react-query';
import { candidateKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { Candidates } from '../types';

export const getCandidates = (productId: number, radioId: number) =>
  apiRequest<Candidates>(`/products/${productId}/radios/${radioId}/candidates`, { query: { limit: 30 } });

export const getCandidatesQueryOptions = (productId: number, radioId: number) =>
  queryOptions({ queryKey: candidateKeys.radio(productId, radioId), queryFn: () => getCandidates(productId, radioId) });

export const useCandidates = (productId: number, radioId: number | null) =>
  useQuery({ ...getCandidatesQueryOptions(productId, radioId ?? 0), enabled: radioId !== null });
