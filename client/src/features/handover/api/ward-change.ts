import { z } from 'zod';

/** The `data` of a `ward-change` event: only the ward matters to the client, which refetches. */
export const wardChangeSchema = z.object({
  wardId: z.number().int(),
  kind: z.string(),
  orderId: z.number().int(),
  at: z.string(),
});
