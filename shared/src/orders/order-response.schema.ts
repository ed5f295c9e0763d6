import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import type { Finding } from '../dose/types.js';
import { doseUnitSchema } from '../drugs/drug.schema.js';
import { limitRuleSchema } from '../library/library.schema.js';
import { observationDueSchema } from '../observations/observation-due.js';
import type { OrderDerivedValues, OrderPreview } from './order-fields.schema.js';
import { orderStatusSchema } from './order-status.js';
import {
  REGIMEN_TYPES,
  RELEASE_STATUSES,
  type FlagResponse,
  type OrderDetail,
  type OrderEventResponse,
  type OrderListEntry,
  type OrderSummary,
  type SyringeReleaseResponse,
} from './order.schema.js';

// The order answers as schemas, typed against the shared types so that drift fails the type check.

export const findingSchema: z.ZodType<Finding> = answer(
  'Finding',
  z.object({ field: z.string(), severity: z.enum(['hard', 'soft', 'error', 'caution']), code: z.string(), message: z.string() }),
);

export const derivedValuesSchema: z.ZodType<OrderDerivedValues> = answer(
  'OrderDerivedValues',
  z.object({
    demandDoseMl: z.number(),
    basalRateMlPerHour: z.number(),
    maxDemandsPerHour: z.number(),
    maxHourlyDose: z.number(),
    maxFourHourDose: z.number(),
  }),
);

export const syringeReleaseSchema: z.ZodType<SyringeReleaseResponse> = answer(
  'SyringeRelease',
  z.object({
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
  }),
);

export const flagSeveritySchema = z.enum(['info', 'review', 'urgent']);

export const flagSchema: z.ZodType<FlagResponse> = answer(
  'Flag',
  z.object({
    id: z.number().int(),
    severity: flagSeveritySchema,
    code: z.string(),
    message: z.string(),
    action: z.string(),
    raisedAt: z.string(),
    acknowledgedAt: z.string().nullable(),
    acknowledgedByName: z.string().nullable(),
    acknowledgeNote: z.string().nullable(),
  }),
);

const orderEventSchema: z.ZodType<OrderEventResponse> = z.object({
  id: z.number().int(),
  fromStatus: orderStatusSchema.nullable(),
  toStatus: orderStatusSchema,
  userId: z.number().int(),
  userName: z.string(),
  at: z.string(),
  reason: z.string().nullable(),
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

export const orderSummarySchema: z.ZodType<OrderSummary> = answer('OrderSummary', z.object(summaryShape));

export const orderListEntrySchema: z.ZodType<OrderListEntry> = answer(
  'OrderListEntry',
  z.object({
    ...summaryShape,
    syringeState: z.enum(['running', 'ready', 'none']),
    nextObservation: observationDueSchema.nullable(),
    openUrgentFlags: z.number().int(),
    paused: z.boolean(),
    otherOpenOrders: z.array(
      z.object({
        id: z.number().int(),
        status: orderStatusSchema,
        drugName: z.string(),
        doseUnit: doseUnitSchema,
        concentrationPerMl: z.number(),
      }),
    ),
  }),
);

export const orderDetailSchema: z.ZodType<OrderDetail> = answer(
  'OrderDetail',
  z.object({
    ...summaryShape,
    derived: derivedValuesSchema,
    findings: z.array(findingSchema),
    overrides: z.array(z.object({ field: z.string(), reason: z.string() })),
    rule: limitRuleSchema.nullable(),
    verifiedByName: z.string().nullable(),
    verifiedAt: z.string().nullable(),
    events: z.array(orderEventSchema),
    releases: z.array(syringeReleaseSchema),
    flags: z.array(flagSchema),
    startedAt: z.string().nullable(),
    nextObservation: observationDueSchema.nullable(),
    paused: z.boolean(),
  }),
);

export const orderPreviewSchema: z.ZodType<OrderPreview> = answer(
  'OrderPreview',
  z.object({ derived: derivedValuesSchema, findings: z.array(findingSchema), rule: limitRuleSchema.nullable() }),
);
