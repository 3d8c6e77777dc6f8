import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { rfToolKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { LinkBudgetRequest, LinkBudgetResponse } from '../types';

export const computeLinkBudget = (input: LinkBudgetRequest) => apiRequest<LinkBudgetResponse>('/rf/link-budget', { method: 'POST', body: input });

export const getLinkBudgetQueryOptions = (input: LinkBudgetRequest) =>
  queryOptions({ queryKey: rfToolKeys.linkBudget(input), queryFn: () => computeLinkBudget(input), staleTime: Infinity, retry: false });

export const useLinkBudget = (input: LinkBudgetRequest | null) =>
  useQuery({ ...getLinkBudgetQueryOptions(input!), enabled: input !== null, placeholderData: keepPreviousData });
