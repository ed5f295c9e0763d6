import { queryOptions, useQuery } from '@tanstack/react-query';
import { libraryAffectedOrdersSchema, type LibraryAffectedOrders } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys } from './library-keys';

/** The ward's verified and running orders that the version's limits would put outside (pharmacists). */
export function getAffectedOrders(id: number, signal?: AbortSignal): Promise<LibraryAffectedOrders> {
  return apiRequest(`/library/versions/${id}/affected-orders`, { schema: libraryAffectedOrdersSchema, signal });
}

export function affectedOrdersQueryOptions(id: number) {
  return queryOptions({
    queryKey: libraryKeys.affectedOrders(id),
    queryFn: ({ signal }) => getAffectedOrders(id, signal),
    // Orders start and stop while a pharmacist reviews: read afresh each time the dialog opens.
    staleTime: 0,
  });
}

export function useAffectedOrders(id: number) {
  return useQuery(affectedOrdersQueryOptions(id));
}
