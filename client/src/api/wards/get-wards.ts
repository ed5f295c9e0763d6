import { queryOptions, useQuery } from '@tanstack/react-query';
import { wardSchema, type Ward } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { wardKeys } from './ward-keys';

export function getWards(signal?: AbortSignal): Promise<Ward[]> {
  return apiRequest('/wards', { schema: wardSchema.array(), signal });
}

export function wardsQueryOptions() {
  return queryOptions({
    queryKey: wardKeys.lists(),
    queryFn: ({ signal }) => getWards(signal),
    // Wards change rarely (an admin task); keep them for the session.
    staleTime: 10 * 60_000,
  });
}

export function useWards() {
  return useQuery(wardsQueryOptions());
}
