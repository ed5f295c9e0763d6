import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { doseUnitSchema } from '../drugs/drug.schema.js';
import { observationDueSchema } from '../observations/observation-due.js';
import { SEDATION_LEVELS } from '../observations/sedation-scale.js';
import { flagSchema } from '../orders/order-response.schema.js';
import { orderStatusSchema } from '../orders/order-status.js';
import { allergySeveritySchema } from '../patients/patient.schema.js';
import {
  SHIFTS,
  SIGNOFF_ROLES,
  type HandoverBoard,
  type HandoverRow,
  type HandoverSignoffResponse,
  type PendingTask,
} from './handover.schema.js';

export const signoffSchema: z.ZodType<HandoverSignoffResponse> = answer(
  'HandoverSignoff',
  z.object({
    id: z.number().int(),
    orderId: z.number().int(),
    shiftDate: z.string(),
    shift: z.enum(SHIFTS),
    role: z.enum(SIGNOFF_ROLES),
    nurseName: z.string(),
    pumpSettingsMatch: z.boolean().nullable(),
    at: z.string(),
  }),
);

const pendingTaskSchema: z.ZodType<PendingTask> = z.object({
  code: z.enum(['awaiting_verification', 'awaiting_bedside_check', 'reconciliation_discrepancy', 'review_date_passed']),
  since: z.string(),
});

const rowSchema: z.ZodType<HandoverRow> = answer(
  'HandoverRow',
  z.object({
    orderId: z.number().int(),
    status: orderStatusSchema,
    bed: z.string(),
    patient: z.object({
      id: z.number().int(),
      name: z.string(),
      mrn: z.string(),
      ageYears: z.number(),
      weightKg: z.number().nullable(),
      allergies: z.array(z.object({ substance: z.string(), reaction: z.string(), severity: allergySeveritySchema })),
      noKnownAllergies: z.boolean(),
    }),
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
    paused: z.boolean(),
    pendingTasks: z.array(pendingTaskSchema),
    signoffs: z.array(signoffSchema),
    riskTier: z.union([z.literal(0), z.literal(1), z.literal(2), z.literal(3)]),
  }),
);

export const handoverBoardSchema: z.ZodType<HandoverBoard> = answer(
  'HandoverBoard',
  z.object({
    wardId: z.number().int(),
    wardName: z.string(),
    generatedAt: z.string(),
    shift: z.object({ shift: z.enum(SHIFTS), shiftDate: z.string(), startsAt: z.string(), endsAt: z.string() }),
    rows: z.array(rowSchema),
  }),
);
