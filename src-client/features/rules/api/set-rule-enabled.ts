import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRules } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';

export const setRuleEnabled = ({ id, enabled, version }: { id: string; enabled: boolean; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}/enabled`, { method: 'PUT', body: { enabled, version } });

export const useSetRuleEnabled = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setRuleEnabled, onSuccess: () => invalidateRules(queryClient) });
};
