import { queryOptions, useQuery } from '@tanstack/react-query';
import { productKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ProductSummary } from '../types';

export const getProducts = () => apiRequest<ProductSummary[]>('/products');

export const getProductsQueryOptions = () => queryOptions({ queryKey: productKeys.list(), queryFn: getProducts });

export const useProducts = () => useQuery(getProductsQueryOptions());

/** The deleted products, most recently deleted first (admins only). */
export const getDeletedProducts = () => apiRequest<ProductSummary[]>('/products', { query: { deleted: true } });

export const getDeletedProductsQueryOptions = () => queryOptions({ queryKey: productKeys.deleted(), queryFn: getDeletedProducts });

export const useDeletedProducts = (enabled: boolean) => useQuery({ ...getDeletedProductsQueryOptions(), enabled });
