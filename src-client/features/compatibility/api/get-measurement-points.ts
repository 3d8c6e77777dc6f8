import { useQuery } from '@tanstack/react-query';
import { getMeasurementPointsQueryOptions } from '../../../api/parts';

export const usePoints = (partId: number | null, measurementId: number | undefined) =>
  useQuery({ ...getMeasurementPointsQueryOptions(partId ?? 0, measurementId ?? 0), enabled: partId !== null && measurementId !== undefined });
