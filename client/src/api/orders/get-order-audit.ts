import { queryOptions, useQuery } from '@tanstack/react-query';
import { auditEventSchema, type AuditEvent } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { orderKeys } from './order-keys';

/** Everything that happened to one order, oldest first. */
export function getOrderAudit(orderId: number, signal?: AbortSignal): Promise<AuditEvent[]> {
  return apiRequest(`/orders/${orderId}/audit`, { schema: auditEventSchema.array(), signal });
}

export function orderAuditQueryOptions(orderId: number) {
  return queryOptions({
    queryKey: orderKeys.audit(orderId),
    queryFn: ({ signal }) => getOrderAudit(orderId, signal),
    // The story grows while the page is open (a release, a check); read it afresh each visit.
    staleTime: 0,
  });
}

export function useOrderAudit(orderId: number) {
  return useQuery(orderAuditQueryOptions(orderId));
}
