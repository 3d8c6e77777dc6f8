import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteOffer = ({ id, offerId }: { id: number; offerId: number }) => apiRequest<void>(`/parts/${id}/offers/${offerId}`, { method: 'DELETE' });

export const useDeleteOffer = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteOffer, onSuccess: (_result, input) => invalidatePart(queryClient, input.id) });
};
