import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateUsers } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { ChangeRoleInput, UserRow } from '../types';

export const changeUserRole = ({ id, role }: ChangeRoleInput & { id: number }) =>
  apiRequest<UserRow>(`/users/${id}/role`, { method: 'PATCH', body: { role } satisfies ChangeRoleInput });

export const useChangeUserRole = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: changeUserRole, onSuccess: () => invalidateUsers(queryClient) });
};
