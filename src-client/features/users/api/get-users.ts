import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { UserRow } from '../types';
import { userKeys } from './user-keys';

export const getUsers = () => apiRequest<UserRow[]>('/users');

export const getUsersQueryOptions = () => queryOptions({ queryKey: userKeys.list(), queryFn: getUsers });

export const useUsers = () => useQuery(getUsersQueryOptions());
