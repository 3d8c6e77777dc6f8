import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditPage } from '../../../api/audit-entries';
import { productKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';

export const getProductHistory = (id: number) => apiRequest<AuditPage>(`/products/${id}/history`);

export const getProductHistoryQueryOptions = (id: number) => queryOptions({ queryKey: productKeys.history(id), queryFn: () => getProductHistory(id) });

export const useProductHistory = (id: number) => useQuery(getProductHistoryQueryOptions(id));
