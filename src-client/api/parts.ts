import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest, type Query } from '../lib/api-client';
import type { components } from '../lib/api-types';
import { partKeys } from './query-keys';

type Schemas = components['schemas'];

/** GET /parts: the catalogue search, also used by pickers that look a part up by text. */
export const searchParts = (filters: Query) => apiRequest<Schemas['PartListDto']>('/parts', { query: filters });

export const getPartSearchQueryOptions = (filters: Query) =>
  queryOptions({ queryKey: partKeys.search(filters), queryFn: () => searchParts(filters), placeholderData: keepPreviousData });

/** GET /parts/:id; `ranges` ("791-862,880-960" in MHz) adds the part's coverage of those ranges. */
export const getPart = (id: number, ranges?: string) => apiRequest<Schemas['PartDetailDto']>(`/parts/${id}`, { query: { ranges } });

export const getPartQueryOptions = (id: number, ranges?: string) => queryOptions({ queryKey: partKeys.detail(id, ranges), queryFn: () => getPart(id, ranges) });

/** A stored measurement's points never change (a new upload is a new measurement), so they are cached for good. */
export const getMeasurementPoints = (id: number, measurementId: number) =>
  apiRequest<Schemas['MeasurementPointsDto']>(`/parts/${id}/measurements/${measurementId}/points`);

export const getMeasurementPointsQueryOptions = (id: number, measurementId: number) =>
  queryOptions({ queryKey: partKeys.points(id, measurementId), queryFn: () => getMeasurementPoints(id, measurementId), staleTime: Infinity });
