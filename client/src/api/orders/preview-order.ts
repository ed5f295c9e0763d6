import { keepPreviousData, queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { orderPreviewSchema, type OrderFields, type OrderPreview } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** The server's own check of an unsigned order: derived values and findings; nothing is written. */
export function previewOrder(fields: OrderFields, signal?: AbortSignal): Promise<OrderPreview> {
  return apiRequest('/orders/preview', { method: 'POST', body: fields, schema: orderPreviewSchema, signal });
}

/** A POST used as a query: keyed by the fields, so typing back to a value reuses its answer. */
export function orderPreviewQueryOptions(fields: OrderFields | null) {
  return queryOptions({
    queryKey: fields ? orderKeys.preview(fields) : orderKeys.previews(),
    queryFn: fields ? ({ signal }) => previewOrder(fields, signal) : skipToken,
    // The same fields give the same answer until the library changes; a minute is plenty.
    staleTime: 60_000,
  });
}

/** `null` while the form cannot be checked yet (no rule chosen, a number missing). */
export function useOrderPreview(fields: OrderFields | null) {
  return useQuery({ ...orderPreviewQueryOptions(fields), placeholderData: keepPreviousData });
}
