import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateAssignment } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Assignment, AssignmentTarget } from '../types';

/** `role`: which of the radio's antennas the part is for (the server takes main when it is left out). */
export const choosePart = ({ productId, radioId, partId, role }: AssignmentTarget) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/choice`, { method: 'PUT', body: role ? { partId, role } : { partId } });

export const useChoosePart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: choosePart, onSuccess: (_assignments, target) => invalidateAssignment(queryClient, target.productId) });
};
