import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateAssignment } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Assignment, AssignmentTarget } from '../types';

export const removeFromShortlist = ({ productId, radioId, partId }: AssignmentTarget) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/shortlist/${partId}`, { method: 'DELETE' });

export const useRemoveFromShortlist = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: removeFromShortlist, onSuccess: (_assignments, target) => invalidateAssignment(queryClient, target.productId) });
};
