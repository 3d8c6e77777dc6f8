import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ChangeRoleInput, UserRow } from '../types';
import { userKeys } from './user-keys';

export const changeUserRole = ({ id, role }: ChangeRoleInput & { id: number }) =>
  apiRequest<UserRow>(`/users/${id}/role`, { method: 'PATCH', body: { role } satisfies ChangeRoleInput });

export const useChangeUserRole = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changeUserRole, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
};
