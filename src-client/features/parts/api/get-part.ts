import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions } from '../../../api/parts';

export const usePart = (id: number, ranges?: string) => useQuery(getPartQueryOptions(id, ranges));
