import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditPage } from '../../../api/audit-entries';
import { apiRequest } from '../../../lib/api-client';
import type { operations } from '../../../lib/api-types';

export type AuditFilter = NonNullable<operations['AuditController_list']['parameters']['query']>;

export const auditKeys = {
  all: ['audit'] as const,
  list: (filter: AuditFilter) => [...auditKeys.all, 'list', filter] as const,
};

export const getAuditLog = (filter: AuditFilter) => apiRequest<AuditPage>('/audit', { query: { ...filter } });

export const getAuditLogQueryOptions = (filter: AuditFilter) =>
  queryOptions({ queryKey: auditKeys.list(filter), queryFn: () => getAuditLog(filter), placeholderData: keepPreviousData });

export const useAuditLog = (filter: AuditFilter) => useQuery(getAuditLogQueryOptions(filter));
