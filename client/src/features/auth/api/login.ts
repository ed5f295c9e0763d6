import { useMutation } from '@tanstack/react-query';
import { loginResponseSchema, type LoginRequest, type LoginResponse } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';

export function login(credentials: LoginRequest): Promise<LoginResponse> {
  // Anonymous: a 401 here means wrong credentials, shown on the form, not an ended session.
  return apiRequest('/auth/login', {
    method: 'POST',
    body: credentials,
    schema: loginResponseSchema,
    anonymous: true,
  });
}

export function useLogin() {
  return useMutation({ mutationFn: login });
}
