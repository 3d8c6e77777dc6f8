import { queryOptions, useQuery } from '@tanstack/react-query';
import { inProductKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ProductIsolation } from '../types';

export const getIsolation = (productId: number) => apiRequest<ProductIsolation>(`/products/${productId}/isolation`);

export const getIsolationQueryOptions = (productId: number) =>
  queryOptions({ queryKey: inProductKeys.isolation(productId), queryFn: () => getIsolation(productId) });

export const useIsolation = (productId: number) => useQuery(getIsolationQueryOptions(productId));
