import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateVerdicts } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';
import { ruleKeys } from './rule-keys';

export const setRuleEnabled = ({ id, enabled, version }: { id: string; enabled: boolean; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}/enabled`, { method: 'PUT', body: { enabled, version } });

export const useSetRuleEnabled = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setRuleEnabled,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: ruleKeys.all }), invalidateVerdicts(queryClient)]),
  });
};
