import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateUsers } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { InviteInput, UserRow } from '../types';

export const inviteUser = (input: InviteInput) => apiRequest<UserRow>('/users/invitations', { method: 'POST', body: input });

export const useInviteUser = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => invalidateUsers(queryClient) });
};
