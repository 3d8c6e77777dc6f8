import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { HistoryEntry, MeasurementPoints, PartDetail } from '../types';
import { partKeys } from './part-keys';

export const getPart = (id: number, ranges?: string) => apiRequest<PartDetail>(`/parts/${id}`, { query: { ranges } });

export const getPartQueryOptions = (id: number, ranges?: string) => queryOptions({ queryKey: partKeys.detail(id, ranges), queryFn: () => getPart(id, ranges) });

export const usePart = (id: number, ranges?: string) => useQuery(getPartQueryOptions(id, ranges));

export const getMeasurementPoints = (id: number, measurementId: number) => apiRequest<MeasurementPoints>(`/parts/${id}/measurements/${measurementId}/points`);

export const useMeasurementPoints = (id: number, measurementId: number | undefined) =>
  useQuery({ queryKey: partKeys.points(id, measurementId ?? 0), queryFn: () => getMeasurementPoints(id, measurementId!), enabled: measurementId !== undefined, staleTime: Infinity });

export const getPartHistory = (id: number) => apiRequest<{ items: HistoryEntry[]; total: number }>(`/parts/${id}/history`, { query: { limit: 100 } });

export const usePartHistory = (id: number) => useQuery({ queryKey: partKeys.history(id), queryFn: () => getPartHistory(id) });
