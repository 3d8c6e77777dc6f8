import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LoginResult } from './login';

export interface SetPasswordInput {
  token: string;
  password: string;
  name?: string;
}

/** Accepting an invitation and finishing a reset both set a password with an e-mailed token. */
export const acceptInvitation = (input: SetPasswordInput) => apiRequest<LoginResult>('/auth/accept-invitation', { method: 'POST', body: input });
export const resetPassword = (input: SetPasswordInput) =>
  apiRequest<LoginResult>('/auth/password-reset', { method: 'POST', body: { token: input.token, password: input.password } });

export const useAcceptInvitation = () => useMutation({ mutationFn: acceptInvitation });
export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
