import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RuleValidation } from '../types';

export const validateRule = (definition: unknown) => apiRequest<RuleValidation>('/rules/validation', { method: 'POST', body: { definition } });

/** A check, so a mutation: nothing is stored and nothing needs invalidating. */
export const useValidateRule = () => useMutation({ mutationFn: validateRule });
