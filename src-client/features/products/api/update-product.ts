import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail, ProductUpdate } from '../types';

export const updateProduct = ({ id, ...input }: ProductUpdate & { id: number }) =>
  apiRequest<ProductDetail>(`/products/${id}`, { method: 'PATCH', body: input });

export const useUpdateProduct = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the dialog needs the other person's version.
  return useMutation({ mutationFn: updateProduct, onSettled: (_product, _error, input) => invalidateProduct(queryClient, input.id) });
};
