import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';

export const getRule = (id: string) => apiRequest<RuleDetail>(`/rules/${id}`);

export const getRuleQueryOptions = (id: string) => queryOptions({ queryKey: ruleKeys.detail(id), queryFn: () => getRule(id) });

/** The rule with its whole definition; null (a new rule) reads nothing. */
export const useRule = (id: string | null) => useQuery({ ...getRuleQueryOptions(id ?? ''), enabled: id !== null });
