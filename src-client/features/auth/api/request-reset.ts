import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export const requestPasswordReset = (email: string) => apiRequest<{ status: string }>('/auth/password-reset-requests', { method: 'POST', body: { email } });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
