import { queryOptions, useQuery } from '@tanstack/react-query';
import { demoAccountsSchema, type DemoAccounts } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export function getDemoAccounts(signal?: AbortSignal): Promise<DemoAccounts> {
  return apiRequest('/auth/demo-accounts', { schema: demoAccountsSchema, anonymous: true, signal });
}

export function demoAccountsQueryOptions() {
  return queryOptions({
    queryKey: authKeys.demoAccounts(),
    queryFn: ({ signal }) => getDemoAccounts(signal),
    staleTime: Infinity,
    // Sign-in must work even if this optional list cannot be fetched.
    retry: false,
  });
}

export function useDemoAccounts() {
  return useQuery(demoAccountsQueryOptions());
}
