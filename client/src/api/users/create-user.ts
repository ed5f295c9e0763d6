import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type CreateUserRequest, type User } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { userKeys } from './user-keys';

export interface CreateUserVariables {
  input: CreateUserRequest;
  /** One key per opening of the new-user dialog, sent as `Idempotency-Key`: a double-click or a retry creates one account. */
  idempotencyKey: string;
}

export function createUser({ input, idempotencyKey }: CreateUserVariables): Promise<User> {
  return apiRequest('/users', { method: 'POST', body: input, schema: userSchema, headers: { 'Idempotency-Key': idempotencyKey } });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
