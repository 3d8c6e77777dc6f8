import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditPage } from '../../../api/audit-entries';
import { auditKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { operations } from '../../../lib/api-types';

export type AuditFilter = NonNullable<operations['AuditController_list']['parameters']['query']>;

export const getAuditLog = (filter: AuditFilter) => apiRequest<AuditPage>('/audit', { query: { ...filter } });

export const getAuditLogQueryOptions = (filter: AuditFilter) =>
  queryOptions({ queryKey: auditKeys.list(filter), queryFn: () => getAuditLog(filter), placeholderData: keepPreviousData });

export const useAuditLog = (filter: AuditFilter) => useQuery(getAuditLogQueryOptions(filter));
