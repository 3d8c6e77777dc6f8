import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { RuleVersion } from '../types';

export const getRuleVersions = (id: string) => apiRequest<RuleVersion[]>(`/rules/${id}/versions`);

export const getRuleVersionsQueryOptions = (id: string) => queryOptions({ queryKey: ruleKeys.versions(id), queryFn: () => getRuleVersions(id) });

/** Who changed the rule and when; null (a new rule) reads nothing. */
export const useRuleVersions = (id: string | null) => useQuery({ ...getRuleVersionsQueryOptions(id ?? ''), enabled: id !== null });
