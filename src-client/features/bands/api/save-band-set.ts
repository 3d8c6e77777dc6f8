import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BandSet, BandSetInput } from '../types';
import { bandKeys } from './band-keys';

export const createBandSet = (input: BandSetInput) => apiRequest<BandSet>('/band-sets', { method: 'POST', body: input });
export const updateBandSet = ({ id, ...input }: BandSetInput & { id: number }) => apiRequest<BandSet>(`/band-sets/${id}`, { method: 'PATCH', body: input });
export const deleteBandSet = (id: number) => apiRequest<void>(`/band-sets/${id}`, { method: 'DELETE' });

const useInvalidatingMutation = <A, R>(fn: (arg: A) => Promise<R>) => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: bandKeys.sets() }) });
};

export const useCreateBandSet = () => useInvalidatingMutation(createBandSet);
export const useUpdateBandSet = () => useInvalidatingMutation(updateBandSet);
export const useDeleteBandSet = () => useInvalidatingMutation(deleteBandSet);
