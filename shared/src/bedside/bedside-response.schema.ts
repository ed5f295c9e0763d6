import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { orderDetailSchema } from '../orders/order-response.schema.js';
import type { FirstCheckResponse, PumpSettings, ReconciliationResponse, SecondCheckResponse } from './bedside.schema.js';
import { PUMP_SETTING_FIELDS } from './bedside.schema.js';

const amount = z.number().nullable();

export const firstCheckResponseSchema: z.ZodType<FirstCheckResponse> = answer(
  'FirstCheckResult',
  z.object({ id: z.number().int(), status: z.literal('awaiting_second') }),
);

export const secondCheckResponseSchema: z.ZodType<SecondCheckResponse> = answer(
  'SecondCheckResult',
  z.object({
    id: z.number().int(),
    status: z.enum(['matched', 'mismatch']),
    differences: z.array(
      z.object({
        field: z.enum(PUMP_SETTING_FIELDS as readonly (keyof PumpSettings)[] as [keyof PumpSettings, ...(keyof PumpSettings)[]]),
        first: amount,
        second: amount,
        ordered: amount,
        differs: z.enum(['first', 'second', 'both']),
      }),
    ),
  }),
);

/** A syringe's reconciliation as a bedside answer gives it, with the code of the syringe it is about. */
export const reconciliationSchema = answer(
  'Reconciliation',
  z.object({
    dispensedMl: z.number(),
    infusedMl: z.number(),
    wastedMl: z.number(),
    discrepancyMl: z.number(),
    mustReport: z.boolean(),
    releaseCode: z.string(),
  }),
);
export type ReleaseReconciliation = z.infer<typeof reconciliationSchema> & ReconciliationResponse;

export const bolusResponseSchema = answer(
  'ClinicianBolus',
  z.object({
    id: z.number().int(),
    orderId: z.number().int(),
    amount: z.number(),
    doseUnit: z.string(),
    reason: z.string(),
    overrideReason: z.string().nullable(),
    givenByName: z.string(),
    witnessName: z.string(),
    at: z.string(),
  }),
);
export type BolusResponse = z.infer<typeof bolusResponseSchema>;

export const syringeChangeResponseSchema = answer(
  'SyringeChangeResult',
  z.object({ reconciliation: reconciliationSchema, newReleaseCode: z.string(), nextStep: z.string() }),
);
export type SyringeChangeResponse = z.infer<typeof syringeChangeResponseSchema>;

export const discontinueResponseSchema = answer(
  'DiscontinueResult',
  z.object({ order: orderDetailSchema, reconciliation: reconciliationSchema }),
);
export type DiscontinueResponse = z.infer<typeof discontinueResponseSchema>;
