import { queryOptions, useQuery } from '@tanstack/react-query';
import { productKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail } from '../types';

export const getProduct = (id: number) => apiRequest<ProductDetail>(`/products/${id}`);

export const getProductQueryOptions = (id: number) => queryOptions({ queryKey: productKeys.detail(id), queryFn: () => getProduct(id) });

export const useProduct = (id: number) => useQuery(getProductQueryOptions(id));
