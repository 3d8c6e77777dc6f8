import { useQuery } from '@tanstack/react-query';
import { getMeasurementPointsQueryOptions } from '../../../api/parts';
import type { MeasurementPoints } from '../types';

export const usePoints = (partId: number | null, measurementId: number | undefined) =>
  useQuery({
    ...getMeasurementPointsQueryOptions<MeasurementPoints>(partId ?? 0, measurementId ?? 0),
    enabled: partId !== null && measurementId !== undefined,
  });
