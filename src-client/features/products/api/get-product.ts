import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail } from '../types';
import { productKeys } from './product-keys';

export const getProduct = (id: number) => apiRequest<ProductDetail>(`/products/${id}`);

export const getProductQueryOptions = (id: number) => queryOptions({ queryKey: productKeys.detail(id), queryFn: () => getProduct(id) });

export const useProduct = (id: number) => useQuery(getProductQueryOptions(id));
