import { queryOptions, useQuery } from '@tanstack/react-query';
import { UserListResponseSchema, type UserDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { userKeys } from './keys';

export async function getUsers(signal?: AbortSignal): Promise<UserDto[]> {
  const { items } = await api.get('/users', UserListResponseSchema, { signal });
  return items;
}

export const usersQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.list(),
    queryFn: ({ signal }) => getUsers(signal),
  });

export function useUsers() {
  return useQuery(usersQueryOptions());
}
