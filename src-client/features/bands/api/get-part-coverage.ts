import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions } from '../../../api/parts';

/** The part's detail (the one cache every page showing the part shares), read for its covered ranges. */
export const usePartCoverage = (id: number | null) => useQuery({ ...getPartQueryOptions(id ?? 0), enabled: id !== null });
