import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRadio } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteRadio = ({ productId, radioId, version }: { productId: number; radioId: number; version: number }) =>
  apiRequest<void>(`/products/${productId}/radios/${radioId}`, { method: 'DELETE', query: { version } });

export const useDeleteRadio = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the list shows what the other person saved.
  return useMutation({ mutationFn: deleteRadio, onSettled: (_result, _error, input) => invalidateRadio(queryClient, input.productId) });
};
