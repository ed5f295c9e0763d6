import { queryOptions, useQuery } from '@tanstack/react-query';
import { libraryVersionSchema, type LibraryVersion } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

/** Newest first. */
export function getLibraryVersions(wardId: number, signal?: AbortSignal): Promise<LibraryVersion[]> {
  return apiRequest('/library/versions', { schema: libraryVersionSchema.array(), params: { wardId }, signal });
}

export function libraryVersionsQueryOptions(wardId: number) {
  return queryOptions({
    queryKey: libraryKeys.versionList(wardId),
    queryFn: ({ signal }) => getLibraryVersions(wardId, signal),
  });
}

export function useLibraryVersions(wardId: number | null) {
  return useQuery({ ...libraryVersionsQueryOptions(wardId ?? 0), enabled: wardId !== null });
}
