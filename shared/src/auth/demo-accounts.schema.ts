import { z } from 'zod';
import { roleSchema } from './roles.js';

/** Public answer of GET /api/auth/demo-accounts: who a visitor can sign in as in demo mode. */
export const demoAccountsSchema = z.object({
  demo: z.boolean(),
  password: z.string().nullable(),
  accounts: z.array(z.object({ username: z.string(), displayName: z.string(), role: roleSchema })),
});
export type DemoAccounts = z.infer<typeof demoAccountsSchema>;
