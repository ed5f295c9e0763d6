import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type UpdateUserRequest, type User } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { userKeys } from './user-keys';

export interface UpdateUserVariables {
  id: number;
  changes: UpdateUserRequest;
  /** One key per opening of the form, sent as `Idempotency-Key` like the other writes (the same for a retry). */
  idempotencyKey: string;
}

export function updateUser({ id, changes, idempotencyKey }: UpdateUserVariables): Promise<User> {
  return apiRequest(`/users/${id}`, { method: 'PATCH', body: changes, schema: userSchema, headers: { 'Idempotency-Key': idempotencyKey } });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
