import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest, type Query } from '../lib/api-client';
import { bandKeys, bandSetKeys } from './query-keys';

// Each feature names the view of a band it reads (TBand), until the client's API types are generated.

/** The band library changes only with a release, so it stays fresh for minutes. */
const LIBRARY_STALE_MS = 5 * 60_000;

export const getBands = <TBand>(filter: Query = {}) => apiRequest<TBand[]>('/bands', { query: filter });

export const getBandsQueryOptions = <TBand>(filter: Query = {}) =>
  queryOptions({ queryKey: bandKeys.list(filter), queryFn: () => getBands<TBand>(filter), placeholderData: keepPreviousData, staleTime: LIBRARY_STALE_MS });

export const getBandSets = <TBandSet>() => apiRequest<TBandSet[]>('/band-sets');

export const getBandSetsQueryOptions = <TBandSet>() => queryOptions({ queryKey: bandSetKeys.list(), queryFn: () => getBandSets<TBandSet>() });
