import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RuleProblem } from '../types';

export const validateRule = (definition: unknown) =>
  apiRequest<{ valid: boolean; problems: RuleProblem[] }>('/rules/validation', { method: 'POST', body: { definition } });

/** A check, so a mutation: nothing is stored and nothing needs invalidating. */
export const useValidateRule = () => useMutation({ mutationFn: validateRule });
