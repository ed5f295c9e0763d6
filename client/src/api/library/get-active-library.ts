import { queryOptions, useQuery } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export function getActiveLibrary(wardId: number, signal?: AbortSignal): Promise<LibraryVersionDetail> {
  return apiRequest(`/wards/${wardId}/library`, { schema: libraryVersionDetailSchema, signal });
}

export function activeLibraryQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: libraryKeys.active(wardId),
    queryFn: ({ signal }) => getActiveLibrary(wardId, signal),
  });
}

export function useActiveLibrary(wardId: number | null, options: { enabled?: boolean } = {}) {
  return useQuery({ ...activeLibraryQueryOptions(wardId ?? 0), enabled: wardId !== null && (options.enabled ?? true) });
}
