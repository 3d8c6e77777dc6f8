import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateVerdicts } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';
import { ruleKeys } from './rule-keys';

export const updateRule = ({ id, definition, version }: { id: string; definition: unknown; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}`, { method: 'PUT', body: { definition, version } });

export const useUpdateRule = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRule,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: ruleKeys.all }), invalidateVerdicts(queryClient)]),
  });
};
