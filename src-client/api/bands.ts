import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '../lib/api-client';
import type { components, operations } from '../lib/api-types';
import { bandKeys, bandSetKeys } from './query-keys';

type Band = components['schemas']['BandDto'];
type BandSet = components['schemas']['BandSetDto'];
export type BandFilter = NonNullable<operations['BandsController_list']['parameters']['query']>;

/** The band library changes only with a release, so it stays fresh for minutes. */
const LIBRARY_STALE_MS = 5 * 60_000;

/** GET /bands: the band library, every feature's one fetcher for it. */
export const getBands = (filter: BandFilter = {}) => apiRequest<Band[]>('/bands', { query: { ...filter } });

export const getBandsQueryOptions = (filter: BandFilter = {}) =>
  queryOptions({ queryKey: bandKeys.list({ ...filter }), queryFn: () => getBands(filter), placeholderData: keepPreviousData, staleTime: LIBRARY_STALE_MS });

/** GET /band-sets. */
export const getBandSets = () => apiRequest<BandSet[]>('/band-sets');

export const getBandSetsQueryOptions = () => queryOptions({ queryKey: bandSetKeys.list(), queryFn: getBandSets });
