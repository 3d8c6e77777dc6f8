import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { PartDetail } from '../types';
import type { PartInput } from './create-part';

export const updatePart = ({ id, ...input }: PartInput & { id: number; version: number }) =>
  apiRequest<PartDetail>(`/parts/${id}`, { method: 'PATCH', body: input });

export const useUpdatePart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updatePart, onSuccess: (_part, input) => invalidatePart(queryClient, input.id) });
};
