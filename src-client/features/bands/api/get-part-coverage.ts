import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { bandKeys } from './band-keys';

export interface PartCoverage {
  id: number;
  manufacturer: string;
  mpn: string;
  coveredRanges: { fromMhz: number; toMhz: number; source: 'measured' | 'spec' }[];
}

interface PartMatch {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
}

/** Parts whose text matches, for the band strip's "compare a part" picker. */
export const searchPartsForStrip = (q: string) => apiRequest<{ items: PartMatch[] }>('/parts', { query: { q, limit: 8 } }).then((r) => r.items);

export const getPartCoverage = (id: number) => apiRequest<PartCoverage>(`/parts/${id}`);

export const getPartMatchesQueryOptions = (q: string) =>
  queryOptions({ queryKey: [...bandKeys.all, 'part-matches', q], queryFn: () => searchPartsForStrip(q), enabled: q.trim().length >= 2 });

export const getPartCoverageQueryOptions = (id: number | null) =>
  queryOptions({ queryKey: [...bandKeys.all, 'part-coverage', id], queryFn: () => getPartCoverage(id!), enabled: id !== null });

export const usePartMatches = (q: string) => useQuery(getPartMatchesQueryOptions(q));
export const usePartCoverage = (id: number | null) => useQuery(getPartCoverageQueryOptions(id));
