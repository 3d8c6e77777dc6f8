import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LoginResult, SetPasswordInput } from '../types';

/** Finishing a reset sets a password with the e-mailed token. */
export const resetPassword = (input: SetPasswordInput) =>
  apiRequest<LoginResult>('/auth/password-reset', { method: 'POST', body: { token: input.token, password: input.password } });

export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
