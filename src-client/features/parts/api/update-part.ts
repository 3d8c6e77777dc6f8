import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { PartDetail, PartUpdate } from '../types';

export const updatePart = ({ id, ...input }: PartUpdate & { id: number }) => apiRequest<PartDetail>(`/parts/${id}`, { method: 'PATCH', body: input });

export const useUpdatePart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updatePart, onSuccess: (_part, input) => invalidatePart(queryClient, input.id) });
};
