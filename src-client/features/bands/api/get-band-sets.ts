import { useQuery } from '@tanstack/react-query';
import { getBandSetsQueryOptions as getSharedBandSetsQueryOptions } from '../../../api/bands';
import type { BandSet } from '../types';

export const getBandSetsQueryOptions = () => getSharedBandSetsQueryOptions<BandSet>();

export const useBandSets = () => useQuery(getBandSetsQueryOptions());
