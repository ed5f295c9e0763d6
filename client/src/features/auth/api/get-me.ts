import { queryOptions, useQuery } from '@tanstack/react-query';
import { sessionProfileSchema, type SessionProfile } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function getMe(signal?: AbortSignal): Promise<SessionProfile> {
  return apiRequest('/auth/me', { schema: sessionProfileSchema, signal });
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe(options: { enabled?: boolean } = {}) {
  return useQuery({ ...meQueryOptions(), enabled: options.enabled ?? true });
}
