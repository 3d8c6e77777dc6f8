import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet } from '../types';
import { bandKeys } from './band-keys';

export const getBandSets = () => apiRequest<BandSet[]>('/band-sets');

export const getBandSetsQueryOptions = () => queryOptions({ queryKey: bandKeys.sets(), queryFn: getBandSets });

export const useBandSets = () => useQuery(getBandSetsQueryOptions());
