import { useQuery } from '@tanstack/react-query';
import { getMeasurementPointsQueryOptions } from '../../../api/parts';

export const useMeasurementPoints = (id: number, measurementId: number | undefined) =>
  useQuery({ ...getMeasurementPointsQueryOptions(id, measurementId ?? 0), enabled: measurementId !== undefined });
