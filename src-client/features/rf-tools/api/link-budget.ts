import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LinkBudgetRequest, LinkBudgetResponse } from '../types';
import { toolKeys } from './tool-keys';

export const computeLinkBudget = (input: LinkBudgetRequest) => apiRequest<LinkBudgetResponse>('/rf/link-budget', { method: 'POST', body: input });

export const getLinkBudgetQueryOptions = (input: LinkBudgetRequest) =>
  queryOptions({ queryKey: toolKeys.linkBudget(input), queryFn: () => computeLinkBudget(input), staleTime: Infinity, retry: false });

export const useLinkBudget = (input: LinkBudgetRequest | null) =>
  useQuery({ ...getLinkBudgetQueryOptions(input!), enabled: input !== null, placeholderData: keepPreviousData });
