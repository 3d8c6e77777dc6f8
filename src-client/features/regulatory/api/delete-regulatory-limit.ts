import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRegulatoryLimits } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteRegulatoryLimit = (id: number) => apiRequest<void>(`/regulatory-limits/${id}`, { method: 'DELETE' });

export const useDeleteRegulatoryLimit = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteRegulatoryLimit, onSuccess: () => invalidateRegulatoryLimits(queryClient) });
};
