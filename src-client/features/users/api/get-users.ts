import { queryOptions, useQuery } from '@tanstack/react-query';
import { userKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { UserRow } from '../types';

export const getUsers = () => apiRequest<UserRow[]>('/users');

export const getUsersQueryOptions = () => queryOptions({ queryKey: userKeys.list(), queryFn: getUsers });

export const useUsers = () => useQuery(getUsersQueryOptions());
