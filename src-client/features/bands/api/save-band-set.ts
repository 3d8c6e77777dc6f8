import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet, BandSetInput } from '../types';
import { bandKeys } from './band-keys';

export const createBandSet = (input: BandSetInput) => apiRequest<BandSet>('/band-sets', { method: 'POST', body: input });
export const updateBandSet = ({ id, ...input }: BandSetInput & { id: number; version: number }) => apiRequest<BandSet>(`/band-sets/${id}`, { method: 'PATCH', body: input });
export const deleteBandSet = ({ id, version }: { id: number; version: number }) => apiRequest<void>(`/band-sets/${id}`, { method: 'DELETE', query: { version } });

const useInvalidatingMutation = <A, R>(fn: (arg: A) => Promise<R>) => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the dialog needs the other person's version.
  return useMutation({ mutationFn: fn, onSettled: () => queryClient.invalidateQueries({ queryKey: bandKeys.sets() }) });
};

export const useCreateBandSet = () => useInvalidatingMutation(createBandSet);
export const useUpdateBandSet = () => useInvalidatingMutation(updateBandSet);
export const useDeleteBandSet = () => useInvalidatingMutation(deleteBandSet);
