import request from 'supertest';
import type { App } from 'supertest/types.js';

export type MailboxMessage = { id: number; to: string; subject: string; text: string; at: string };

/** Waits (up to 10 s) until the local mailbox holds a message matching `match`; mail is sent after the answer. */
export async function waitForMail(http: App, adminToken: string, match: (message: MailboxMessage) => boolean): Promise<MailboxMessage> {
  const deadline = Date.now() + 10_000;
  for (;;) {
    const response = await request(http).get('/api/dev/mailbox').auth(adminToken, { type: 'bearer' });
    const found = (response.body as MailboxMessage[]).find(match);
    if (found) return found;
    if (Date.now() > deadline)
      throw new Error(
        `No matching e-mail arrived; the mailbox holds: ${JSON.stringify(response.body.map((m: MailboxMessage) => m.subject))}`,
      );
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
