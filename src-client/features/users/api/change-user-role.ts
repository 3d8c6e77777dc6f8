import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Role } from '../../../lib/session';
import type { UserRow } from '../types';
import { userKeys } from './user-keys';

export const changeUserRole = ({ id, role }: { id: number; role: Role }) => apiRequest<UserRow>(`/users/${id}/role`, { method: 'PATCH', body: { role } });

export const useChangeUserRole = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changeUserRole, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
};
