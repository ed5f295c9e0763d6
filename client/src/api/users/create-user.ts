import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type CreateUserRequest, type User } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function createUser(input: CreateUserRequest): Promise<User> {
  return apiRequest('/users', { method: 'POST', body: input, schema: userSchema });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
