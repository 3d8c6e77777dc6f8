import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditPage } from '../../../api/audit-entries';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';

export const getPartHistory = (id: number) => apiRequest<AuditPage>(`/parts/${id}/history`, { query: { limit: 100 } });

export const getPartHistoryQueryOptions = (id: number) => queryOptions({ queryKey: partKeys.history(id), queryFn: () => getPartHistory(id) });

export const usePartHistory = (id: number) => useQuery(getPartHistoryQueryOptions(id));
