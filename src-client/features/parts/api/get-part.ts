import { useQuery } from '@tanstack/react-query';
import { getPartQueryOptions as getSharedPartQueryOptions } from '../../../api/parts';
import type { PartDetail } from '../types';

export const getPartQueryOptions = (id: number, ranges?: string) => getSharedPartQueryOptions<PartDetail>(id, ranges);

export const usePart = (id: number, ranges?: string) => useQuery(getPartQueryOptions(id, ranges));
