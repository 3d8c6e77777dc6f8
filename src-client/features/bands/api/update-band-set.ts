import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateBandSets } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet, BandSetUpdate } from '../types';

export const updateBandSet = ({ id, ...input }: BandSetUpdate & { id: number }) => apiRequest<BandSet>(`/band-sets/${id}`, { method: 'PATCH', body: input });

export const useUpdateBandSet = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the dialog needs the other person's version.
  return useMutation({ mutationFn: updateBandSet, onSettled: () => invalidateBandSets(queryClient) });
};
