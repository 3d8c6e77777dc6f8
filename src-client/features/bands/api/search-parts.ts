import { useQuery } from '@tanstack/react-query';
import { getPartSearchQueryOptions } from '../../../api/parts';

export interface PartMatch {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
}

/** Parts whose text matches, for the band strip's "compare a part" picker. */
export const usePartMatches = (q: string) =>
  useQuery({ ...getPartSearchQueryOptions<{ items: PartMatch[] }>({ q, limit: 8 }), select: (list) => list.items, enabled: q.trim().length >= 2 });
