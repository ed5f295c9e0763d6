import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';
import { versionDiffSchema, type VersionDiff } from './library-schemas';

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
