import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateAssignment } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Assignment, AssignmentTarget } from '../types';

export const shortlistPart = ({ productId, radioId, partId }: AssignmentTarget) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/shortlist`, { method: 'POST', body: { partId } });

export const useShortlistPart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: shortlistPart, onSuccess: (_assignments, target) => invalidateAssignment(queryClient, target.productId) });
};
