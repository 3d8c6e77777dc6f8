import { queryOptions, useQuery } from '@tanstack/react-query';
import { matrixKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { Matrix } from '../types';

export const getMatrix = (productId: number) => apiRequest<Matrix>(`/products/${productId}/matrix`);

export const getMatrixQueryOptions = (productId: number) => queryOptions({ queryKey: matrixKeys.product(productId), queryFn: () => getMatrix(productId) });

export const useMatrix = (productId: number) => useQuery(getMatrixQueryOptions(productId));
