import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { DOSE_UNITS } from '../drugs/drug.schema.js';
import { flagSeveritySchema } from '../orders/order-response.schema.js';
import { observationDueSchema } from './observation-due.js';
import { CONSCIOUSNESS_LEVELS } from './news2.js';
import { OXYGEN_DEVICES } from './observations-requests.schema.js';
import { SEDATION_LEVELS } from './sedation-scale.js';

const news2ScoreSchema = z.object({
  parameters: z.object({
    respiration: z.number(),
    spo2: z.number(),
    airOrOxygen: z.number(),
    systolicBp: z.number(),
    pulse: z.number(),
    consciousness: z.number(),
    temperature: z.number(),
  }),
  total: z.number(),
  response: z.enum(['low', 'low-medium', 'medium', 'high']),
});

const observationShape = {
  id: z.number().int(),
  orderId: z.number().int(),
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
  oxygenLitresPerMinute: z.number().nullable(),
  oxygenDevice: z.enum(OXYGEN_DEVICES).nullable(),
  heartRate: z.number().nullable(),
  systolicBp: z.number().nullable(),
  temperatureC: z.number().nullable(),
  consciousness: z.enum(CONSCIOUSNESS_LEVELS).nullable(),
  /** NEWS2 (Royal College of Physicians, 2017) when the full set is present on an adult; null otherwise. */
  news2: news2ScoreSchema.nullable(),
  /** Why NEWS2 was not scored (a child, or a value missing); null when it was. */
  news2NotScored: z.string().nullable(),
  note: z.string(),
  recordedByName: z.string(),
};

export const observationSchema = answer('Observation', z.object(observationShape));
export type ObservationResponse = z.infer<typeof observationSchema>;

/** A flag as the observation that raised it answers it. */
export const raisedFlagSchema = z.object({
  id: z.number().int(),
  severity: flagSeveritySchema,
  code: z.string(),
  message: z.string(),
  action: z.string(),
});
export type RaisedFlag = z.infer<typeof raisedFlagSchema>;

export const recordedObservationSchema = answer('RecordedObservation', z.object({ ...observationShape, flags: z.array(raisedFlagSchema) }));
export type RecordedObservation = z.infer<typeof recordedObservationSchema>;

const totalsSchema = z.object({ attempts: z.number(), delivered: z.number(), dose: z.number(), bolusDose: z.number() });

export const usageSchema = answer(
  'Usage',
  z.object({
    hours: z.number(),
    buckets: z.array(totalsSchema.extend({ start: z.string() })),
    totals: totalsSchema,
    rolling24hDose: z.number(),
    averageDosePerHour: z.number(),
    oralMorphineEquivalent24hMg: z.number().nullable(),
    /** The factors of pharmacy's equianalgesic table the figure used, each with its source; null when none is set. */
    oralMorphineFactors: z
      .object({
        parenteralAmount: z.number(),
        parenteralUnit: z.enum(DOSE_UNITS),
        parenteralSource: z.string(),
        oralMorphineMg: z.number(),
        oralSource: z.string(),
      })
      .nullable(),
    doseUnit: z.string(),
    projectedEmptyAt: z.string().nullable(),
    nextObservation: observationDueSchema.nullable(),
  }),
);
export type UsageResponse = z.infer<typeof usageSchema>;
