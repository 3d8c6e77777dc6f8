import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { getBandSetsQueryOptions, getBandsQueryOptions } from '../../../api/bands';
import type { BandChoice, BandSetChoice } from '../types';

/** The band library and band sets, for picking a radio's bands (the same cache the band pages use). */
export function useBandChoices() {
  const bands = useQuery(getBandsQueryOptions<BandChoice>());
  const sets = useQuery(getBandSetsQueryOptions<BandSetChoice>());
  const data = useMemo(() => (bands.data && sets.data ? { bands: bands.data, sets: sets.data } : undefined), [bands.data, sets.data]);
  return { data, isPending: bands.isPending || sets.isPending, error: bands.error ?? sets.error };
}
