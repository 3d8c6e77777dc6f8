import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit, RegulatoryLimitInput } from '../types';
import { bandKeys } from './band-keys';

export const createRegulatoryLimit = (input: RegulatoryLimitInput) => apiRequest<RegulatoryLimit>('/regulatory-limits', { method: 'POST', body: input });
export const updateRegulatoryLimit = ({ id, ...input }: RegulatoryLimitInput & { id: number }) =>
  apiRequest<RegulatoryLimit>(`/regulatory-limits/${id}`, { method: 'PATCH', body: input });
export const deleteRegulatoryLimit = (id: number) => apiRequest<void>(`/regulatory-limits/${id}`, { method: 'DELETE' });

const useInvalidatingMutation = <A, R>(fn: (arg: A) => Promise<R>) => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: bandKeys.limits() }) });
};

export const useCreateRegulatoryLimit = () => useInvalidatingMutation(createRegulatoryLimit);
export const useUpdateRegulatoryLimit = () => useInvalidatingMutation(updateRegulatoryLimit);
export const useDeleteRegulatoryLimit = () => useInvalidatingMutation(deleteRegulatoryLimit);
