import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateBandSets } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet, BandSetInput } from '../types';

export const createBandSet = (input: BandSetInput) => apiRequest<BandSet>('/band-sets', { method: 'POST', body: input });

export const useCreateBandSet = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createBandSet, onSuccess: () => invalidateBandSets(queryClient) });
};
