import { queryOptions, useQuery } from '@tanstack/react-query';
import { productKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { HistoryEntry } from '../types';

export const getProductHistory = (id: number) => apiRequest<{ items: HistoryEntry[]; total: number }>(`/products/${id}/history`);

export const getProductHistoryQueryOptions = (id: number) => queryOptions({ queryKey: productKeys.history(id), queryFn: () => getProductHistory(id) });

export const useProductHistory = (id: number) => useQuery(getProductHistoryQueryOptions(id));
