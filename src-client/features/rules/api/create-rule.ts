import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateVerdicts } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';
import { ruleKeys } from './rule-keys';

export const createRule = (definition: unknown) => apiRequest<RuleDetail>('/rules', { method: 'POST', body: { definition } });

export const useCreateRule = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRule,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: ruleKeys.all }), invalidateVerdicts(queryClient)]),
  });
};
