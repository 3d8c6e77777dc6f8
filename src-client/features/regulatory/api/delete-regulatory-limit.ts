import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { limitKeys } from './limit-keys';

export const deleteRegulatoryLimit = (id: number) => apiRequest<void>(`/regulatory-limits/${id}`, { method: 'DELETE' });

export const useDeleteRegulatoryLimit = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteRegulatoryLimit, onSuccess: () => queryClient.invalidateQueries({ queryKey: limitKeys.all }) });
};
