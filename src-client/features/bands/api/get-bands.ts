import { useQuery } from '@tanstack/react-query';
import { getBandsQueryOptions as getSharedBandsQueryOptions } from '../../../api/bands';
import type { Band, BandFilter } from '../types';

export const getBandsQueryOptions = (filter: BandFilter = {}) => getSharedBandsQueryOptions<Band>({ ...filter });

export const useBands = (filter: BandFilter = {}) => useQuery(getBandsQueryOptions(filter));
