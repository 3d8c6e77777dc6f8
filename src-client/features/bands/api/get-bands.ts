import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Band, BandFilter } from '../types';
import { bandKeys } from './band-keys';

export const getBands = (filter: BandFilter = {}) => apiRequest<Band[]>('/bands', { query: { ...filter } });

export const getBandsQueryOptions = (filter: BandFilter = {}) =>
  queryOptions({ queryKey: bandKeys.list(filter), queryFn: () => getBands(filter), placeholderData: keepPreviousData, staleTime: 5 * 60_000 });

export const useBands = (filter: BandFilter = {}) => useQuery(getBandsQueryOptions(filter));
