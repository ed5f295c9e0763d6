import { queryOptions, useQuery } from '@tanstack/react-query';
import { userSchema, type User } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function getUsers(signal?: AbortSignal): Promise<User[]> {
  return apiRequest('/users', { schema: userSchema.array(), signal });
}

export function usersQueryOptions() {
  return queryOptions({
    queryKey: userKeys.lists(),
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
