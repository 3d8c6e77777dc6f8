import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit, RegulatoryLimitUpdate } from '../types';
import { limitKeys } from './limit-keys';

export const updateRegulatoryLimit = ({ id, ...input }: RegulatoryLimitUpdate & { id: number }) =>
  apiRequest<RegulatoryLimit>(`/regulatory-limits/${id}`, { method: 'PATCH', body: input });

export const useUpdateRegulatoryLimit = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateRegulatoryLimit, onSuccess: () => queryClient.invalidateQueries({ queryKey: limitKeys.all }) });
};
