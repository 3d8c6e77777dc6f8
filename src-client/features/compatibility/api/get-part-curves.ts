import { useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MeasurementPoints, PartMeasurements } from '../types';
import { compatibilityKeys } from './compatibility-keys';

export const getPartMeasurements = (partId: number) => apiRequest<PartMeasurements>(`/parts/${partId}`);

export const usePartMeasurements = (partId: number | null) =>
  useQuery({ queryKey: compatibilityKeys.partMeasurements(partId ?? 0), queryFn: () => getPartMeasurements(partId!), enabled: partId !== null });

export const getPoints = (partId: number, measurementId: number) => apiRequest<MeasurementPoints>(`/parts/${partId}/measurements/${measurementId}/points`);

export const usePoints = (partId: number | null, measurementId: number | undefined) =>
  useQuery({ queryKey: compatibilityKeys.points(partId ?? 0, measurementId ?? 0), queryFn: () => getPoints(partId!, measurementId!), enabled: partId !== null && measurementId !== undefined, staleTime: Infinity });
