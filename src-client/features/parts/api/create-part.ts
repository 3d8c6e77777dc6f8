import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { PartDetail, PartInput } from '../types';

export const createPart = (input: PartInput) => apiRequest<PartDetail>('/parts', { method: 'POST', body: input });

export const useCreatePart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createPart, onSuccess: (part) => invalidatePart(queryClient, part.id) });
};
