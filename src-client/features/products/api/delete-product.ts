import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteProduct = ({ id, version }: { id: number; version: number }) =>
  apiRequest<void>(`/products/${id}`, { method: 'DELETE', query: { version } });

export const useDeleteProduct = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the page shows the other person's version.
  return useMutation({ mutationFn: deleteProduct, onSettled: (_result, _error, input) => invalidateProduct(queryClient, input.id) });
};
