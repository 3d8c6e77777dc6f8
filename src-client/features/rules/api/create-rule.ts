import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRules } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';

export const createRule = (definition: unknown) => apiRequest<RuleDetail>('/rules', { method: 'POST', body: { definition } });

export const useCreateRule = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createRule, onSuccess: () => invalidateRules(queryClient) });
};
