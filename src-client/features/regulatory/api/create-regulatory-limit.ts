import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRegulatoryLimits } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit, RegulatoryLimitInput } from '../types';

export const createRegulatoryLimit = (input: RegulatoryLimitInput) => apiRequest<RegulatoryLimit>('/regulatory-limits', { method: 'POST', body: input });

export const useCreateRegulatoryLimit = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createRegulatoryLimit, onSuccess: () => invalidateRegulatoryLimits(queryClient) });
};
