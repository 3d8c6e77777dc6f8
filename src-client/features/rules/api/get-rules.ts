import { queryOptions, useQuery } from '@tanstack/react-query';
import { ruleKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { RuleSummary } from '../types';

export const getRules = () => apiRequest<RuleSummary[]>('/rules');

export const getRulesQueryOptions = () => queryOptions({ queryKey: ruleKeys.list(), queryFn: getRules });

export const useRules = () => useQuery(getRulesQueryOptions());
