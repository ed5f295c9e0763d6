import { z } from 'zod';
import type { WardPolicy } from '@lockstep/shared';

// The shared package types the policy values but not the e-mail addresses the server adds, nor
// a schema; the screen checks the answer here, typed against the shared type to catch drift.

export type WardPolicySettings = WardPolicy & { pharmacyEmail: string; nurseInChargeEmail: string };

export type WardPolicyUpdate = Partial<WardPolicySettings>;

export const wardPolicySettingsSchema: z.ZodType<WardPolicySettings> = z.object({
  observationIntervalFirst24hMinutes: z.number(),
  observationIntervalMinutes: z.number(),
  respiratoryRateThreshold: z.number(),
  spo2Threshold: z.number(),
  syringeLowThresholdHours: z.number(),
  reconciliationToleranceMl: z.number(),
  painNotControlledScore: z.number(),
  painNotControlledRatio: z.number(),
  pharmacyEmail: z.string(),
  nurseInChargeEmail: z.string(),
});
