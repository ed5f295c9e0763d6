import { z } from 'zod';
import {
  observationDueSchema,
  doseUnitSchema,
  limitRuleSchema,
  orderStatusSchema,
  REGIMEN_TYPES,
  RELEASE_STATUSES,
  type Finding,
  type OrderDerivedValues,
  type OrderDetail,
  type OrderEventResponse,
  type OrderPreview,
  type OrderSummary,
  type SyringeReleaseResponse,
} from '@lockstep/shared';

// The shared package types the order answers but has no schema for them, so the client checks
// them here, typed against the shared types so that any drift fails the type check.

export const findingSchema: z.ZodType<Finding> = z.object({
  field: z.string(),
  severity: z.enum(['hard', 'soft', 'error', 'caution']),
  code: z.string(),
  message: z.string(),
});

export const derivedValuesSchema: z.ZodType<OrderDerivedValues> = z.object({
  demandDoseMl: z.number(),
  basalRateMlPerHour: z.number(),
  maxDemandsPerHour: z.number(),
  maxHourlyDose: z.number(),
  maxFourHourDose: z.number(),
});

export const releaseSchema: z.ZodType<SyringeReleaseResponse> = z.object({
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

const eventSchema: z.ZodType<OrderEventResponse> = z.object({
  id: z.number().int(),
  fromStatus: orderStatusSchema.nullable(),
  toStatus: orderStatusSchema,
  userId: z.number().int(),
  userName: z.string(),
  at: z.string(),
  reason: z.string().nullable(),
});

const flagSchema = z.object({
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

export const orderSummarySchema: z.ZodType<OrderSummary> = z.object(summaryShape);

export const orderDetailSchema: z.ZodType<OrderDetail> = z.object({
  ...summaryShape,
  derived: derivedValuesSchema,
  findings: z.array(findingSchema),
  overrides: z.array(z.object({ field: z.string(), reason: z.string() })),
  rule: limitRuleSchema.nullable(),
  verifiedByName: z.string().nullable(),
  verifiedAt: z.string().nullable(),
  events: z.array(eventSchema),
  releases: z.array(releaseSchema),
  // Flags and the start time come with the bedside work; defaults keep an older server readable.
  flags: z.array(flagSchema).default([]),
  startedAt: z.string().nullable().default(null),
  nextObservation: observationDueSchema.nullable().default(null),
});

export const orderPreviewSchema: z.ZodType<OrderPreview> = z.object({
  derived: derivedValuesSchema,
  findings: z.array(findingSchema),
  rule: limitRuleSchema.nullable(),
});
