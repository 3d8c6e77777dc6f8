import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface AuditEntry {
  id: string;
  entityType: string;
  entityId: string;
  action: string;
  user: { id: number; name: string; email: string } | null;
  changes: Record<string, unknown>;
  at: string;
}

export interface AuditFilter {
  entityType?: string;
  limit: number;
  offset: number;
}

export const auditKeys = {
  all: ['audit'] as const,
  list: (filter: AuditFilter) => [...auditKeys.all, 'list', filter] as const,
};

export const getAuditLog = (filter: AuditFilter) => apiRequest<{ items: AuditEntry[]; total: number }>('/audit', { query: { ...filter } });

export const getAuditLogQueryOptions = (filter: AuditFilter) =>
  queryOptions({ queryKey: auditKeys.list(filter), queryFn: () => getAuditLog(filter), placeholderData: keepPreviousData });

export const useAuditLog = (filter: AuditFilter) => useQuery(getAuditLogQueryOptions(filter));
