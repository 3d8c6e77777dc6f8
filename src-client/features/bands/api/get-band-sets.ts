import { useQuery } from '@tanstack/react-query';
import { getBandSetsQueryOptions } from '../../../api/bands';

export const useBandSets = () => useQuery(getBandSetsQueryOptions());
