import { queryOptions, useQuery } from '@tanstack/react-query';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { HistoryEntry } from '../types';

export const getPartHistory = (id: number) => apiRequest<{ items: HistoryEntry[]; total: number }>(`/parts/${id}/history`, { query: { limit: 100 } });

export const getPartHistoryQueryOptions = (id: number) => queryOptions({ queryKey: partKeys.history(id), queryFn: () => getPartHistory(id) });

export const usePartHistory = (id: number) => useQuery(getPartHistoryQueryOptions(id));
