import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ResetRequest } from '../types';

// The server answers 202 whether or not the address is known, so the answer's body carries nothing to read.
export const requestPasswordReset = (email: string) =>
  apiRequest<unknown>('/auth/password-reset-requests', { method: 'POST', body: { email } satisfies ResetRequest });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
