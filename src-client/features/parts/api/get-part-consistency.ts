import { queryOptions, useQuery } from '@tanstack/react-query';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { PartConsistency } from '../types';

export const getPartConsistency = (id: number) => apiRequest<PartConsistency>(`/parts/${id}/consistency`);

export const getPartConsistencyQueryOptions = (id: number) => queryOptions({ queryKey: partKeys.consistency(id), queryFn: () => getPartConsistency(id) });

export const usePartConsistency = (id: number) => useQuery(getPartConsistencyQueryOptions(id));
