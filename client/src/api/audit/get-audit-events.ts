import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { auditPageSchema, type AuditPage, type AuditQuery } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { auditKeys } from './audit-keys';

/** One page of the audit trail, newest first. */
export function getAuditEvents(query: AuditQuery, signal?: AbortSignal): Promise<AuditPage> {
  return apiRequest('/audit', { schema: auditPageSchema, params: { ...query }, signal });
}

export function auditEventsQueryOptions(query: AuditQuery) {
  return queryOptions({
    queryKey: auditKeys.search(query),
    queryFn: ({ signal }) => getAuditEvents(query, signal),
    // Turning a page keeps the old rows on screen until the next ones arrive.
    placeholderData: keepPreviousData,
    staleTime: 0,
  });
}

export function useAuditEvents(query: AuditQuery) {
  return useQuery(auditEventsQueryOptions(query));
}
