import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions } from '../../../api/parts';

/** The part's detail (cached once for every page that shows the part), read for its measurements. */
export const usePartMeasurements = (partId: number | null) => useQuery({ ...getPartQueryOptions(partId ?? 0), enabled: partId !== null });
