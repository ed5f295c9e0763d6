import { z } from 'zod';
import { auditEventSchema, auditPageSchema, auditVerifySchema } from '../audit/audit.schema.js';
import { demoAccountsSchema } from '../auth/demo-accounts.schema.js';
import { loginResponseSchema, sessionProfileSchema } from '../auth/login.schema.js';
import { drugSchema } from '../drugs/drug.schema.js';
import { patientSchema } from '../patients/patient.schema.js';
import { userSchema } from '../users/user.schema.js';
import { wardSchema } from '../wards/ward.schema.js';
import { answer } from './response-registry.js';

// Answers whose schemas were written with their requests; named here for the API document.
answer('LoginResult', loginResponseSchema);
answer('SessionProfile', sessionProfileSchema);
answer('DemoAccounts', demoAccountsSchema);
answer('User', userSchema);
answer('Ward', wardSchema);
answer('Patient', patientSchema);
answer('Drug', drugSchema);
answer('AuditEvent', auditEventSchema);
answer('AuditPage', auditPageSchema);
answer('AuditChainCheck', auditVerifySchema);

export const healthSchema = answer('Health', z.object({ status: z.literal('ok') }));

/** A username or network address locked after wrong passwords. */
export const lockoutSchema = answer(
  'Lockout',
  z.object({ kind: z.enum(['username', 'address']), key: z.string(), failures: z.number().int(), retryAfterSeconds: z.number().int() }),
);
export type Lockout = z.infer<typeof lockoutSchema>;

/** A message the embedded SMTP catcher received. */
export const mailboxMessageSchema = answer(
  'MailboxMessage',
  z.object({ id: z.number().int(), to: z.string(), subject: z.string(), text: z.string(), at: z.string() }),
);
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
