import { z } from 'zod';
import {
  observationDueSchema,
  doseUnitSchema,
  orderStatusSchema,
  REGIMEN_TYPES,
  RELEASE_STATUSES,
  type FlagResponse,
  type OrderDetail,
  type OrderSummary,
  type ReconciliationResponse,
  type SecondCheckResponse,
  type SyringeReleaseResponse,
} from '@lockstep/shared';

// The shared package types these answers without schemas, so the bedside checks them here,
// typed against the shared types so that drift fails the type check. Only what the bedside
// reads is kept (the parser drops the rest of an order detail).

const amount = z.number().nullable();

const summaryShape = {
  id: z.number().int(),
  version: z.number().int(),
  supersedesId: z.number().int().nullable(),
  status: orderStatusSchema,
  regimenType: z.enum(REGIMEN_TYPES),
  patientId: z.number().int(),
  patientName: z.string(),
  patientMrn: z.string(),
  wardId: z.number().int(),
  wardName: z.string(),
  bed: z.string(),
  drugId: z.number().int(),
  drugName: z.string(),
  doseUnit: doseUnitSchema,
  concentrationPerMl: z.number(),
  loadingDose: amount,
  demandDose: z.number(),
  lockoutMinutes: z.number(),
  basalRatePerHour: z.number(),
  oneHourLimit: amount,
  fourHourLimit: amount,
  clinicianBolusDose: amount,
  indication: z.string(),
  reviewDate: z.string(),
  prescriberId: z.number().int(),
  prescriberName: z.string(),
  signedAt: z.string(),
  statusChangedAt: z.string(),
  statusReason: z.string().nullable(),
};

export const bedsideOrderSummarySchema: z.ZodType<OrderSummary> = z.object(summaryShape);

const releaseSchema: z.ZodType<SyringeReleaseResponse> = z.object({
  id: z.number().int(),
  orderId: z.number().int(),
  releaseCode: z.string(),
  status: z.enum(RELEASE_STATUSES),
  concentrationPerMl: z.number(),
  volumeMl: z.number(),
  totalAmount: z.number(),
  doseUnit: doseUnitSchema,
  batch: z.string(),
  expiresAt: z.string(),
  preparedBy: z.string(),
  checkedBy: z.string(),
  overrideReason: z.string().nullable(),
  releasedByName: z.string(),
  releasedAt: z.string(),
});

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

/** An order as the bedside reads it: the summary, its syringes, its flags, when it started and its next observation. */
export type BedsideOrder = OrderSummary & Pick<OrderDetail, 'releases' | 'flags' | 'startedAt' | 'nextObservation'>;

export const bedsideOrderSchema: z.ZodType<BedsideOrder> = z.object({
  ...summaryShape,
  releases: z.array(releaseSchema),
  flags: z.array(flagSchema),
  startedAt: z.string().nullable(),
  nextObservation: observationDueSchema.nullable(),
});

export const firstCheckResponseSchema = z.object({ id: z.number().int(), status: z.literal('awaiting_second') });

export const secondCheckResponseSchema: z.ZodType<SecondCheckResponse> = z.object({
  id: z.number().int(),
  status: z.enum(['matched', 'mismatch']),
  differences: z.array(
    z.object({
      field: z.enum([
        'drugId',
        'concentrationPerMl',
        'syringeVolumeMl',
        'loadingDose',
        'demandDose',
        'lockoutMinutes',
        'basalRatePerHour',
        'oneHourLimit',
        'fourHourLimit',
      ]),
      first: amount,
      second: amount,
      ordered: amount,
      differs: z.enum(['first', 'second', 'both']),
    }),
  ),
});

export const reconciliationSchema: z.ZodType<ReconciliationResponse & { releaseCode: string }> = z.object({
  dispensedMl: z.number(),
  infusedMl: z.number(),
  wastedMl: z.number(),
  discrepancyMl: z.number(),
  mustReport: z.boolean(),
  releaseCode: z.string(),
});
export type BedsideReconciliation = z.infer<typeof reconciliationSchema>;

/** A colleague signing on the same screen: the second nurse or the witness. */
export type Colleague = { username: string; password: string };
