import { useQuery } from '@tanstack/react-query';
import { getBandsQueryOptions } from '../../../api/bands';
import type { BandFilter } from '../types';

export const useBands = (filter: BandFilter = {}) => useQuery(getBandsQueryOptions(filter));
