import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail, ProductInput } from '../types';

export const createProduct = (input: ProductInput) => apiRequest<ProductDetail>('/products', { method: 'POST', body: input });

export const useCreateProduct = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createProduct, onSettled: () => invalidateProduct(queryClient) });
};
