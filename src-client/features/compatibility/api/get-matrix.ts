import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Matrix } from '../types';
import { compatibilityKeys } from './compatibility-keys';

export const getMatrix = (productId: number) => apiRequest<Matrix>(`/products/${productId}/matrix`);

export const getMatrixQueryOptions = (productId: number) => queryOptions({ queryKey: compatibilityKeys.matrix(productId), queryFn: () => getMatrix(productId) });

export const useMatrix = (productId: number) => useQuery(getMatrixQueryOptions(productId));
