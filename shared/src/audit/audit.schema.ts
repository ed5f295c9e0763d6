import { z } from 'zod';

/**
 * What an audit event is about. Order-related work (releases, checks, observations, flags) is filed
 * under its order; `sign-in` events are about a username or network address locked after wrong passwords.
 */
export const AUDIT_ENTITY_TYPES = ['order', 'library-version', 'user', 'ward', 'sign-in', 'equianalgesic-factor', 'patient'] as const;
export const auditEntityTypeSchema = z.enum(AUDIT_ENTITY_TYPES);
export type AuditEntityType = z.infer<typeof auditEntityTypeSchema>;

/** Pharmacists may read these; admins read everything. */
export const PHARMACY_AUDIT_ENTITY_TYPES: readonly AuditEntityType[] = ['order', 'library-version', 'equianalgesic-factor', 'patient'];

export const AUDIT_ACTION_LABELS = {
  'user.create': 'User created',
  'user.update': 'User changed',
  'user.sign-out': 'Signed out',
  'ward.policy-update': 'Ward policy changed',
  'ward.policy-change-propose': 'Ward policy change proposed',
  'ward.policy-change-decline': 'Ward policy change declined',
  'sign-in.unlock': 'Sign-in lock cleared',
  'library-version.create': 'Library draft created',
  'library-version.import': 'Library draft imported from CSV',
  'library-version.rules-replace': 'Library draft rules saved',
  'library-version.submit': 'Library submitted for approval',
  'library-version.withdraw': 'Library submission withdrawn',
  'library-version.approve': 'Library approved and made active',
  'library-version.send-back': 'Library sent back to draft with a comment',
  'library-version.delete': 'Library draft deleted',
  'equianalgesic-factor.update': 'Equianalgesic factor changed',
  'patient.allergy-add': 'Allergy recorded',
  'patient.allergy-remove': 'Allergy entry removed',
  'patient.no-known-allergies': 'No known allergies recorded',
  'patient.tolerance-update': 'Opioid tolerance changed',
  'patient.spo2-scale': 'SpO2 scale changed',
  'patient.weight-record': 'Weight recorded',
  'order.create': 'Order written',
  'order.revise': 'Order revised',
  'order.cancel': 'Order cancelled',
  'order.verify': 'Order verified by pharmacy',
  'order.return': 'Order returned to the prescriber',
  'order.reject': 'Order rejected',
  'order.release': 'Syringe released',
  'order.bedside-first-check': 'Bedside check: first nurse',
  'order.bedside-second-check': 'Bedside check: second nurse',
  'order.bolus': 'Clinician bolus given',
  'order.naloxone': 'Naloxone given (PCA paused)',
  'order.pause': 'PCA paused',
  'order.resume': 'PCA resumed',
  'order.syringe-change': 'Syringe changed',
  'order.discontinue': 'PCA discontinued',
  'order.observation': 'Observation recorded',
  'order.flag-acknowledge': 'Flag acknowledged',
  'order.handover-signoff': 'Confirmed at handover',
} as const;
export type AuditAction = keyof typeof AUDIT_ACTION_LABELS;
export const AUDIT_ACTIONS = Object.keys(AUDIT_ACTION_LABELS) as AuditAction[];

export function auditActionLabel(action: string): string {
  return (AUDIT_ACTION_LABELS as Record<string, string>)[action] ?? action;
}

export const auditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  userId: z.number().int().nullable(),
  actorName: z.string().nullable(),
  action: z.string(),
  entityType: auditEntityTypeSchema,
  entityId: z.string(),
  /** What changed, e.g. `{ respiratoryRateMin: { from: 8, to: 10 } }` or the key values of a new record. */
  summary: z.record(z.string(), z.unknown()),
  prevHash: z.string(),
  hash: z.string(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

export const AUDIT_PAGE_MAX = 200;

export const auditPageSchema = z.object({ events: z.array(auditEventSchema), total: z.number().int() });
export type AuditPage = z.infer<typeof auditPageSchema>;

export const auditVerifySchema = z.object({ ok: z.boolean(), checked: z.number().int(), firstBadId: z.number().int().nullable() });
export type AuditVerifyResult = z.infer<typeof auditVerifySchema>;

/** Query of `GET /api/audit`; every filter optional, newest first. */
export type AuditQuery = {
  entityType?: AuditEntityType;
  entityId?: string;
  userId?: number;
  action?: string;
  from?: string;
  to?: string;
  limit?: number;
  offset?: number;
};
