import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit } from '../types';
import { limitKeys } from './limit-keys';

export const getRegulatoryLimits = () => apiRequest<RegulatoryLimit[]>('/regulatory-limits');

export const getRegulatoryLimitsQueryOptions = () => queryOptions({ queryKey: limitKeys.list(), queryFn: getRegulatoryLimits });

export const useRegulatoryLimits = () => useQuery(getRegulatoryLimitsQueryOptions());
