import { z } from 'zod';
import {
  observationDueSchema,
  doseUnitSchema,
  orderStatusSchema,
  RELEASE_STATUSES,
  REGIMEN_TYPES,
  SEDATION_LEVELS,
  type FlagResponse,
  type ObservationDue,
  type OrderDetail,
  type OrderSummary,
  type SedationLevel,
  type SyringeReleaseResponse,
  type UsageSummary,
} from '@lockstep/shared';

// The shared package types these answers without schemas, so the PCA page checks them here,
// typed against the shared types so that drift fails the type check. Only what the page reads
// is kept (the parser drops the rest of an order detail).

const severitySchema = z.enum(['info', 'review', 'urgent']);

export const flagSchema: z.ZodType<FlagResponse> = z.object({
  id: z.number().int(),
  severity: severitySchema,
  code: z.string(),
  message: z.string(),
  action: z.string(),
  raisedAt: z.string(),
  acknowledgedAt: z.string().nullable(),
  acknowledgedByName: z.string().nullable(),
  acknowledgeNote: z.string().nullable(),
});

const orderShape = {
  id: z.number().int(),
  status: orderStatusSchema,
  regimenType: z.enum(REGIMEN_TYPES),
  patientId: z.number().int(),
  patientName: z.string(),
  patientMrn: z.string(),
  wardId: z.number().int(),
  wardName: z.string(),
  bed: z.string(),
  drugName: z.string(),
  doseUnit: doseUnitSchema,
  concentrationPerMl: z.number(),
  loadingDose: z.number().nullable(),
  demandDose: z.number(),
  lockoutMinutes: z.number(),
  basalRatePerHour: z.number(),
  oneHourLimit: z.number().nullable(),
  fourHourLimit: z.number().nullable(),
  prescriberName: z.string(),
};

export type PcaOrderSummary = Pick<OrderSummary, keyof typeof orderShape>;

export const pcaOrderSummarySchema: z.ZodType<PcaOrderSummary> = z.object(orderShape);

export type PcaRelease = Pick<SyringeReleaseResponse, 'id' | 'status' | 'volumeMl' | 'releaseCode'>;

export type PcaOrder = PcaOrderSummary & Pick<OrderDetail, 'flags' | 'startedAt'> & { releases: PcaRelease[] };

export const pcaOrderSchema: z.ZodType<PcaOrder> = z.object({
  ...orderShape,
  releases: z.array(z.object({ id: z.number().int(), status: z.enum(RELEASE_STATUSES), volumeMl: z.number(), releaseCode: z.string() })),
  flags: z.array(flagSchema),
  startedAt: z.string().nullable(),
});

export type Observation = {
  id: number;
  releaseId: number;
  at: string;
  painScore: number;
  sedationLevel: SedationLevel;
  respiratoryRate: number;
  spo2: number;
  attempts: number;
  delivered: number;
  volumeInfusedMl: number;
  syringeRemainingMl: number;
  note: string;
  recordedByName: string;
};

const observationShape = {
  id: z.number().int(),
  releaseId: z.number().int(),
  at: z.string(),
  painScore: z.number(),
  sedationLevel: z.enum(SEDATION_LEVELS),
  respiratoryRate: z.number(),
  spo2: z.number(),
  attempts: z.number(),
  delivered: z.number(),
  volumeInfusedMl: z.number(),
  syringeRemainingMl: z.number(),
  note: z.string(),
  recordedByName: z.string(),
};

export const observationSchema: z.ZodType<Observation> = z.object(observationShape);

/** A flag as the observation that raised it returns it. */
export type RaisedFlag = Pick<FlagResponse, 'id' | 'severity' | 'code' | 'message' | 'action'>;

export type RecordedObservation = Observation & { flags: RaisedFlag[] };

export const recordedObservationSchema: z.ZodType<RecordedObservation> = z.object({
  ...observationShape,
  flags: z.array(z.object({ id: z.number().int(), severity: severitySchema, code: z.string(), message: z.string(), action: z.string() })),
});

export type PcaUsage = UsageSummary & { doseUnit: string; projectedEmptyAt: string | null; nextObservation: ObservationDue | null };

const totalsSchema = z.object({ attempts: z.number(), delivered: z.number(), dose: z.number(), bolusDose: z.number() });

export const usageSchema: z.ZodType<PcaUsage> = z.object({
  hours: z.number(),
  buckets: z.array(totalsSchema.extend({ start: z.string() })),
  totals: totalsSchema,
  rolling24hDose: z.number(),
  averageDosePerHour: z.number(),
  oralMorphineEquivalent24hMg: z.number().nullable(),
  doseUnit: z.string(),
  projectedEmptyAt: z.string().nullable(),
  nextObservation: observationDueSchema.nullable(),
});
