import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail, ProductInput } from '../types';
import { productKeys } from './product-keys';

export const createProduct = (input: ProductInput) => apiRequest<ProductDetail>('/products', { method: 'POST', body: input });
export const updateProduct = ({ id, ...input }: Partial<ProductInput> & { id: number; version: number }) =>
  apiRequest<ProductDetail>(`/products/${id}`, { method: 'PATCH', body: input });
export const deleteProduct = ({ id, version }: { id: number; version: number }) => apiRequest<void>(`/products/${id}`, { method: 'DELETE', query: { version } });
export const restoreProduct = (id: number) => apiRequest<ProductDetail>(`/products/${id}/restore`, { method: 'POST' });

const useProductMutation = <A, R>(fn: (arg: A) => Promise<R>) => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSettled: () => queryClient.invalidateQueries({ queryKey: productKeys.all }) });
};

export const useCreateProduct = () => useProductMutation(createProduct);
export const useUpdateProduct = () => useProductMutation(updateProduct);
export const useDeleteProduct = () => useProductMutation(deleteProduct);
export const useRestoreProduct = () => useProductMutation(restoreProduct);
