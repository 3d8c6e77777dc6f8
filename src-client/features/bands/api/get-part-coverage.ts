import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions } from '../../../api/parts';

/** Of a part's detail, what the band strip draws. */
export interface PartCoverage {
  id: number;
  manufacturer: string;
  mpn: string;
  coveredRanges: { fromMhz: number; toMhz: number; source: 'measured' | 'spec' }[];
}

export const usePartCoverage = (id: number | null) => useQuery({ ...getPartQueryOptions<PartCoverage>(id ?? 0), enabled: id !== null });
