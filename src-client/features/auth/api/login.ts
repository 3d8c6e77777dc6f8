import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { SessionUser } from '../../../lib/session';

export interface LoginInput {
  email: string;
  password: string;
}

export interface LoginResult {
  accessToken: string;
  expiresIn: number;
  user: SessionUser;
}

export const login = (input: LoginInput) => apiRequest<LoginResult>('/auth/login', { method: 'POST', body: input });

export const useLogin = () => useMutation({ mutationFn: login });
