import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { ProductDetail } from '../types';

export const restoreProduct = (id: number) => apiRequest<ProductDetail>(`/products/${id}/restore`, { method: 'POST' });

export const useRestoreProduct = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: restoreProduct, onSettled: (_product, _error, id) => invalidateProduct(queryClient, id) });
};
