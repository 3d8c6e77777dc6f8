import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { getBandSetsQueryOptions, getBandsQueryOptions } from '../../../api/bands';

/** The band library and band sets, for picking a radio's bands (the same cache the band pages use). */
export function useBandChoices() {
  const bands = useQuery(getBandsQueryOptions());
  const sets = useQuery(getBandSetsQueryOptions());
  const data = useMemo(() => (bands.data && sets.data ? { bands: bands.data, sets: sets.data } : undefined), [bands.data, sets.data]);
  return { data, isPending: bands.isPending || sets.isPending, error: bands.error ?? sets.error };
}
