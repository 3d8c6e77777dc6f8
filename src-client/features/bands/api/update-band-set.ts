import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateBandSets } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet, BandSetInput } from '../types';

export const updateBandSet = ({ id, ...input }: BandSetInput & { id: number; version: number }) =>
  apiRequest<BandSet>(`/band-sets/${id}`, { method: 'PATCH', body: input });

export const useUpdateBandSet = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the dialog needs the other person's version.
  return useMutation({ mutationFn: updateBandSet, onSettled: () => invalidateBandSets(queryClient) });
};
