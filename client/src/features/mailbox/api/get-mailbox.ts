import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxMessageSchema, type MailboxMessage } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { mailboxKeys } from './mailbox-keys';

/** What Lockstep has e-mailed, newest first, as the local mail catcher received it. */
export function getMailbox(signal?: AbortSignal): Promise<MailboxMessage[]> {
  return apiRequest('/dev/mailbox', { schema: mailboxMessageSchema.array(), signal });
}

export function mailboxQueryOptions() {
  return queryOptions({
    queryKey: mailboxKeys.lists(),
    queryFn: ({ signal }) => getMailbox(signal),
    staleTime: 0,
  });
}

export function useMailbox() {
  return useQuery(mailboxQueryOptions());
}
