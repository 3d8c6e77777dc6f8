import { queryOptions, useQuery } from '@tanstack/react-query';
import { matrixKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { Matrix } from '../types';

/** Each radio's bands against its own chosen and shortlisted parts; with chosenOnly, its chosen part only. */
export const getMatrix = (productId: number, chosenOnly = false) =>
  apiRequest<Matrix>(`/products/${productId}/matrix`, { query: chosenOnly ? { chosenOnly: true } : undefined });

export const getMatrixQueryOptions = (productId: number, chosenOnly = false) =>
  queryOptions({ queryKey: matrixKeys.view(productId, chosenOnly), queryFn: () => getMatrix(productId, chosenOnly) });

export const useMatrix = (productId: number, chosenOnly = false) => useQuery(getMatrixQueryOptions(productId, chosenOnly));
