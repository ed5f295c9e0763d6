import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '@/lib/api-client';
import { mailboxKeys } from './mailbox-keys';

// The server types this answer locally (a development aid, not part of the shared contract).
export const mailboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  at: z.string(),
});
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;

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
