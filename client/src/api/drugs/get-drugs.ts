import { queryOptions, useQuery } from '@tanstack/react-query';
import { drugSchema, type Drug } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { drugKeys } from './drug-keys';

export function getDrugs(signal?: AbortSignal): Promise<Drug[]> {
  return apiRequest('/drugs', { schema: drugSchema.array(), signal });
}

export function drugsQueryOptions() {
  return queryOptions({
    queryKey: drugKeys.lists(),
    queryFn: ({ signal }) => getDrugs(signal),
    staleTime: 10 * 60_000,
  });
}

export function useDrugs() {
  return useQuery(drugsQueryOptions());
}
