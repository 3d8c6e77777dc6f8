import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail, RulePreview, RuleProblem } from '../types';
import { ruleKeys } from './rule-keys';

export const createRule = (definition: unknown) => apiRequest<RuleDetail>('/rules', { method: 'POST', body: { definition } });
export const updateRule = ({ id, definition, version }: { id: string; definition: unknown; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}`, { method: 'PUT', body: { definition, version } });
export const setRuleEnabled = ({ id, enabled, version }: { id: string; enabled: boolean; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}/enabled`, { method: 'PUT', body: { enabled, version } });
export const validateRule = (definition: unknown) => apiRequest<{ valid: boolean; problems: RuleProblem[] }>('/rules/validation', { method: 'POST', body: { definition } });
export const previewRule = (definition: unknown) => apiRequest<RulePreview>('/rules/preview', { method: 'POST', body: { definition } });

function useRuleMutation<A, R>(mutationFn: (args: A) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleKeys.all }) });
}

export const useCreateRule = () => useRuleMutation(createRule);
export const useUpdateRule = () => useRuleMutation(updateRule);
export const useSetRuleEnabled = () => useRuleMutation(setRuleEnabled);
export const useValidateRule = () => useMutation({ mutationFn: validateRule });
export const usePreviewRule = () => useMutation({ mutationFn: previewRule });
