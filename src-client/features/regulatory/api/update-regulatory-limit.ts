import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRegulatoryLimits } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RegulatoryLimit, RegulatoryLimitUpdate } from '../types';

export const updateRegulatoryLimit = ({ id, ...input }: RegulatoryLimitUpdate & { id: number }) =>
  apiRequest<RegulatoryLimit>(`/regulatory-limits/${id}`, { method: 'PATCH', body: input });

export const useUpdateRegulatoryLimit = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateRegulatoryLimit, onSuccess: () => invalidateRegulatoryLimits(queryClient) });
};
