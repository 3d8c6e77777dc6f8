import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Role } from '../../../lib/session';
import type { UserRow } from '../types';
import { userKeys } from './user-keys';

export const changeUserRole = ({ id, role }: { id: number; role: Role }) =>
  apiRequest<UserRow>(`/users/${id}/role`, { method: 'PATCH', body: { role } });

export const setUserActive = ({ id, active }: { id: number; active: boolean }) =>
  apiRequest<UserRow>(`/users/${id}/${active ? 'reactivation' : 'deactivation'}`, { method: 'POST' });

export const useChangeUserRole = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changeUserRole, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
};

export const useSetUserActive = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setUserActive, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
};
