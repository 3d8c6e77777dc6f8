import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { InviteInput, UserRow } from '../types';
import { userKeys } from './user-keys';

export const inviteUser = (input: InviteInput) => apiRequest<UserRow>('/users/invitations', { method: 'POST', body: input });

export const useInviteUser = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
};
