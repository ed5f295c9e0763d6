import { z } from 'zod';
import {
  observationDueSchema,
  doseUnitSchema,
  orderStatusSchema,
  SEDATION_LEVELS,
  SHIFTS,
  SIGNOFF_ROLES,
  type FlagResponse,
  type HandoverBoard,
  type HandoverRow,
  type HandoverSignoffResponse,
  type PendingTask,
} from '@lockstep/shared';

// The shared package types the handover answers but has no schema for them, so the client
// checks them here, typed against the shared types so that any drift fails the type check.

const flagSchema: z.ZodType<FlagResponse> = z.object({
  id: z.number().int(),
  severity: z.enum(['info', 'review', 'urgent']),
  code: z.string(),
  message: z.string(),
  action: z.string(),
  raisedAt: z.string(),
  acknowledgedAt: z.string().nullable(),
  acknowledgedByName: z.string().nullable(),
  acknowledgeNote: z.string().nullable(),
});

export const signoffSchema: z.ZodType<HandoverSignoffResponse> = z.object({
  id: z.number().int(),
  orderId: z.number().int(),
  shiftDate: z.string(),
  shift: z.enum(SHIFTS),
  role: z.enum(SIGNOFF_ROLES),
  nurseName: z.string(),
  pumpSettingsMatch: z.boolean().nullable(),
  at: z.string(),
});

const pendingTaskSchema: z.ZodType<PendingTask> = z.object({
  code: z.enum(['awaiting_verification', 'awaiting_bedside_check', 'reconciliation_discrepancy', 'review_date_passed']),
  since: z.string(),
});

const rowSchema: z.ZodType<HandoverRow> = z.object({
  orderId: z.number().int(),
  status: orderStatusSchema,
  bed: z.string(),
  patient: z.object({ id: z.number().int(), name: z.string(), mrn: z.string(), ageYears: z.number(), weightKg: z.number().nullable() }),
  drugName: z.string(),
  doseUnit: doseUnitSchema,
  concentrationPerMl: z.number(),
  regimen: z.object({
    demandDose: z.number(),
    lockoutMinutes: z.number(),
    basalRatePerHour: z.number(),
    oneHourLimit: z.number().nullable(),
    fourHourLimit: z.number().nullable(),
  }),
  startedAt: z.string().nullable(),
  minutesSinceStart: z.number().nullable(),
  lastObservation: z
    .object({
      at: z.string(),
      painScore: z.number(),
      sedationLevel: z.enum(SEDATION_LEVELS),
      respiratoryRate: z.number(),
      spo2: z.number(),
    })
    .nullable(),
  nextObservation: observationDueSchema.nullable(),
  last4h: z.object({ attempts: z.number(), delivered: z.number(), dose: z.number() }),
  total24hDose: z.number(),
  syringe: z.object({ remainingMl: z.number().nullable(), projectedEmptyAt: z.string().nullable(), emptiesThisShift: z.boolean() }),
  flags: z.object({ urgent: z.number(), review: z.number(), info: z.number(), open: z.array(flagSchema) }),
  pendingTasks: z.array(pendingTaskSchema),
  signoffs: z.array(signoffSchema),
  riskTier: z.union([z.literal(0), z.literal(1), z.literal(2), z.literal(3)]),
});

export const handoverBoardSchema: z.ZodType<HandoverBoard> = z.object({
  wardId: z.number().int(),
  wardName: z.string(),
  generatedAt: z.string(),
  shift: z.object({ shift: z.enum(SHIFTS), shiftDate: z.string(), startsAt: z.string(), endsAt: z.string() }),
  rows: z.array(rowSchema),
});

/** The `data` of a `ward-change` event: only the ward matters to the client, which refetches. */
export const wardChangeSchema = z.object({
  wardId: z.number().int(),
  kind: z.string(),
  orderId: z.number().int(),
  at: z.string(),
});
