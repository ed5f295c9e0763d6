import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import type { WardPolicy } from '../observations/ward-policy.js';

/** A ward's policy values and the addresses its e-mail goes to. */
export type WardPolicySettings = WardPolicy & { pharmacyEmail: string; nurseInChargeEmail: string };

export const wardPolicySettingsSchema: z.ZodType<WardPolicySettings> = answer(
  'WardPolicySettings',
  z.object({
    observationIntervalFirst24hMinutes: z.number(),
    observationIntervalMinutes: z.number(),
    closeObservationIntervalMinutes: z.number(),
    closeObservationPeriodMinutes: z.number(),
    naloxoneClosePeriodMinutes: z.number(),
    respiratoryRateThreshold: z.number(),
    spo2Threshold: z.number(),
    syringeLowThresholdHours: z.number(),
    reconciliationToleranceMl: z.number(),
    painNotControlledScore: z.number(),
    painNotControlledRatio: z.number(),
    weightMaxAgeDays: z.number(),
    pharmacyEmail: z.string(),
    nurseInChargeEmail: z.string(),
  }),
);
