import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { Offer } from '../types';

export const restoreOffer = ({ id, offerId }: { id: number; offerId: number }) =>
  apiRequest<Offer>(`/parts/${id}/offers/${offerId}/restoration`, { method: 'POST' });

/** Undo a removal: the offer is back, and no longer among the removals. */
export const useRestoreOffer = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreOffer,
    onSettled: (_offer, _error, input) =>
      Promise.all([invalidatePart(queryClient, input.id), queryClient.invalidateQueries({ queryKey: partKeys.offerRemovals(input.id) })]),
  });
};
