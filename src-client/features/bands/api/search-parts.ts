import { useQuery } from '@tanstack/react-query';
import { getPartSearchQueryOptions } from '../../../api/parts';

/** Parts whose text matches, for the band strip's "compare a part" picker. */
export const usePartMatches = (q: string) =>
  useQuery({ ...getPartSearchQueryOptions({ q, limit: 8 }), select: (list) => list.items, enabled: q.trim().length >= 2 });
