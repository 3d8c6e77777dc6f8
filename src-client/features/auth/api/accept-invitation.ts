import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LoginResult, SetPasswordInput } from '../types';

/** Accepting an invitation sets a password (and a name) with the e-mailed token. */
export const acceptInvitation = (input: SetPasswordInput) => apiRequest<LoginResult>('/auth/accept-invitation', { method: 'POST', body: input });

export const useAcceptInvitation = () => useMutation({ mutationFn: acceptInvitation });
