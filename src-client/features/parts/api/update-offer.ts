import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Offer, OfferUpdate } from '../types';

export const updateOffer = ({ id, offerId, ...changes }: OfferUpdate & { id: number; offerId: number }) =>
  apiRequest<Offer>(`/parts/${id}/offers/${offerId}`, { method: 'PATCH', body: changes });

export const useUpdateOffer = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateOffer, onSuccess: (_offer, input) => invalidatePart(queryClient, input.id) });
};
