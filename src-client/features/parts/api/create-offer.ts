import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Offer, OfferFormInput } from '../types';

export const createOffer = ({ id, ...offer }: OfferFormInput & { id: number }) => apiRequest<Offer>(`/parts/${id}/offers`, { method: 'POST', body: offer });

export const useCreateOffer = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createOffer, onSuccess: (_offer, input) => invalidatePart(queryClient, input.id) });
};
