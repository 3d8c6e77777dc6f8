import { useQuery } from '@tanstack/react-query';
import { getPartSearchQueryOptions } from '../../../api/parts';
import type { PartFilters, PartList } from '../types';

export const getPartsQueryOptions = (filters: PartFilters) => getPartSearchQueryOptions<PartList>({ ...filters });

export const useParts = (filters: PartFilters) => useQuery(getPartsQueryOptions(filters));
