import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LoginInput, LoginResult } from '../types';

export const login = (input: LoginInput) => apiRequest<LoginResult>('/auth/login', { method: 'POST', body: input });

export const useLogin = () => useMutation({ mutationFn: login });
