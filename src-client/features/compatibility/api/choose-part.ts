import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateAssignment } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Assignment, AssignmentTarget } from '../types';

export const choosePart = ({ productId, radioId, partId }: AssignmentTarget) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/choice`, { method: 'PUT', body: { partId } });

export const useChoosePart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: choosePart, onSuccess: (_assignments, target) => invalidateAssignment(queryClient, target.productId) });
};
