import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateBandSets } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteBandSet = ({ id, version }: { id: number; version: number }) =>
  apiRequest<void>(`/band-sets/${id}`, { method: 'DELETE', query: { version } });

export const useDeleteBandSet = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the list shows the other person's version.
  return useMutation({ mutationFn: deleteBandSet, onSettled: () => invalidateBandSets(queryClient) });
};
