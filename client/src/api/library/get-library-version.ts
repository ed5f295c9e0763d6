import { queryOptions, useQuery } from '@tanstack/react-query';
import { libraryVersionDetailSchema, type LibraryVersionDetail } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

export function getLibraryVersion(id: number, signal?: AbortSignal): Promise<LibraryVersionDetail> {
  return apiRequest(`/library/versions/${id}`, { schema: libraryVersionDetailSchema, signal });
}

export function libraryVersionQueryOptions(id: number) {
  return queryOptions({
    queryKey: libraryKeys.versionDetail(id),
    queryFn: ({ signal }) => getLibraryVersion(id, signal),
  });
}

export function useLibraryVersion(id: number | null) {
  return useQuery({ ...libraryVersionQueryOptions(id ?? 0), enabled: id !== null });
}
