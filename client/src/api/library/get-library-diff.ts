import { queryOptions, useQuery } from '@tanstack/react-query';
import { versionDiffSchema, type VersionDiff } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

/** The version's changes against the ward's active version. */
export function getLibraryDiff(id: number, signal?: AbortSignal): Promise<VersionDiff> {
  return apiRequest(`/library/versions/${id}/diff`, { schema: versionDiffSchema, signal });
}

export function libraryDiffQueryOptions(id: number) {
  return queryOptions({
    queryKey: libraryKeys.diff(id),
    queryFn: ({ signal }) => getLibraryDiff(id, signal),
  });
}

export function useLibraryDiff(id: number, options: { enabled?: boolean } = {}) {
  return useQuery({ ...libraryDiffQueryOptions(id), enabled: options.enabled ?? true });
}
