import { z } from 'zod';
import { signatureSchema } from './order.schema.js';

/** A request that is only a signature: verifying an order. */
export const signedRequestSchema = z.strictObject({ signature: signatureSchema });
export type SignedRequest = z.infer<typeof signedRequestSchema>;
