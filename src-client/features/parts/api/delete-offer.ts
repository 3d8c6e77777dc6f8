import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';

export const deleteOffer = ({ id, offerId }: { id: number; offerId: number }) => apiRequest<void>(`/parts/${id}/offers/${offerId}`, { method: 'DELETE' });

/** A removal can be undone for a while: the removals list is refreshed with the part. */
export const useDeleteOffer = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteOffer,
    onSuccess: (_result, input) =>
      Promise.all([invalidatePart(queryClient, input.id), queryClient.invalidateQueries({ queryKey: partKeys.offerRemovals(input.id) })]),
  });
};
