import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail, RuleSummary, RuleVersion } from '../types';

export const getRules = () => apiRequest<RuleSummary[]>('/rules');
export const getRulesQueryOptions = () => queryOptions({ queryKey: ruleKeys.list(), queryFn: getRules });
export const useRules = () => useQuery(getRulesQueryOptions());

export const getRule = (id: string) => apiRequest<RuleDetail>(`/rules/${id}`);
export const useRule = (id: string | null) => useQuery({ queryKey: ruleKeys.detail(id ?? ''), queryFn: () => getRule(id!), enabled: id !== null });

export const getRuleVersions = (id: string) => apiRequest<RuleVersion[]>(`/rules/${id}/versions`);
export const useRuleVersions = (id: string | null) =>
  useQuery({ queryKey: ruleKeys.versions(id ?? ''), queryFn: () => getRuleVersions(id!), enabled: id !== null });
