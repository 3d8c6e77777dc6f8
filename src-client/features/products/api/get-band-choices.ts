import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BandChoice, BandSetChoice } from '../types';
import { productKeys } from './product-keys';

/** The band library and band sets, for picking a radio's bands. */
export const getBandChoices = async () => {
  const [bands, sets] = await Promise.all([apiRequest<BandChoice[]>('/bands'), apiRequest<BandSetChoice[]>('/band-sets')]);
  return { bands, sets };
};

export const getBandChoicesQueryOptions = () => queryOptions({ queryKey: productKeys.bandChoices(), queryFn: getBandChoices, staleTime: 5 * 60_000 });

export const useBandChoices = () => useQuery(getBandChoicesQueryOptions());
