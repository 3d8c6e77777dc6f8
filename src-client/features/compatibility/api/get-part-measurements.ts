import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions } from '../../../api/parts';
import type { PartMeasurements } from '../types';

/** The part's detail (cached once for every page that shows the part), read for its measurements. */
export const usePartMeasurements = (partId: number | null) => useQuery({ ...getPartQueryOptions<PartMeasurements>(partId ?? 0), enabled: partId !== null });
