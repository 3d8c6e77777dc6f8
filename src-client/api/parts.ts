import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest, type Query } from '../lib/api-client';
import { partKeys } from './query-keys';

// Each feature names the view of a part it reads (TPart, TList), until the client's API types are generated.

/** GET /parts: the catalogue search, also used by pickers that look a part up by text. */
export const searchParts = <TList>(filters: Query) => apiRequest<TList>('/parts', { query: filters });

export const getPartSearchQueryOptions = <TList>(filters: Query) =>
  queryOptions({ queryKey: partKeys.search(filters), queryFn: () => searchParts<TList>(filters), placeholderData: keepPreviousData });

/** GET /parts/:id; `ranges` ("791-862,880-960" in MHz) adds the part's coverage of those ranges. */
export const getPart = <TPart>(id: number, ranges?: string) => apiRequest<TPart>(`/parts/${id}`, { query: { ranges } });

export const getPartQueryOptions = <TPart>(id: number, ranges?: string) =>
  queryOptions({ queryKey: partKeys.detail(id, ranges), queryFn: () => getPart<TPart>(id, ranges) });

/** A stored measurement's points never change (a new upload is a new measurement), so they are cached for good. */
export const getMeasurementPoints = <TPoints>(id: number, measurementId: number) => apiRequest<TPoints>(`/parts/${id}/measurements/${measurementId}/points`);

export const getMeasurementPointsQueryOptions = <TPoints>(id: number, measurementId: number) =>
  queryOptions({ queryKey: partKeys.points(id, measurementId), queryFn: () => getMeasurementPoints<TPoints>(id, measurementId), staleTime: Infinity });
