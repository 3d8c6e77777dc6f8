import { useQuery } from '@tanstack/react-query';
import { getPartSearchQueryOptions } from '../../../api/parts';
import type { PartFilters } from '../types';

export const useParts = (filters: PartFilters) => useQuery(getPartSearchQueryOptions({ ...filters }));
