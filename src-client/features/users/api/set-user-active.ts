import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateUsers } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { UserRow } from '../types';

export const setUserActive = ({ id, active }: { id: number; active: boolean }) =>
  apiRequest<UserRow>(`/users/${id}/${active ? 'reactivation' : 'deactivation'}`, { method: 'POST' });

export const useSetUserActive = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setUserActive, onSuccess: () => invalidateUsers(queryClient) });
};
