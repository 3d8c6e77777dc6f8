import { useQuery } from '@tanstack/react-query';
import { getMeasurementPointsQueryOptions } from '../../../api/parts';
import type { MeasurementPoints } from '../types';

export const useMeasurementPoints = (id: number, measurementId: number | undefined) =>
  useQuery({ ...getMeasurementPointsQueryOptions<MeasurementPoints>(id, measurementId ?? 0), enabled: measurementId !== undefined });
