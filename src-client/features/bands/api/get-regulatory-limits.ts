import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit } from '../types';
import { bandKeys } from './band-keys';

export const getRegulatoryLimits = () => apiRequest<RegulatoryLimit[]>('/regulatory-limits');

export const getRegulatoryLimitsQueryOptions = () => queryOptions({ queryKey: bandKeys.limits(), queryFn: getRegulatoryLimits });

export const useRegulatoryLimits = () => useQuery(getRegulatoryLimitsQueryOptions());
