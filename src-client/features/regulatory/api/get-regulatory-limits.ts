import { queryOptions, useQuery } from '@tanstack/react-query';
import { regulatoryLimitKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit } from '../types';

export const getRegulatoryLimits = () => apiRequest<RegulatoryLimit[]>('/regulatory-limits');

export const getRegulatoryLimitsQueryOptions = () => queryOptions({ queryKey: regulatoryLimitKeys.list(), queryFn: getRegulatoryLimits });

export const useRegulatoryLimits = () => useQuery(getRegulatoryLimitsQueryOptions());
