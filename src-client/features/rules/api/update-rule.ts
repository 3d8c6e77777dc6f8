import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRules } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { RuleDetail } from '../types';

export const updateRule = ({ id, definition, version }: { id: string; definition: unknown; version: number }) =>
  apiRequest<RuleDetail>(`/rules/${id}`, { method: 'PUT', body: { definition, version } });

export const useUpdateRule = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateRule, onSuccess: () => invalidateRules(queryClient) });
};
