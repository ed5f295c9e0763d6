import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import type { PumpSettings } from './bedside.schema.js';
import { PUMP_SETTING_FIELDS } from './bedside.schema.js';
import { NALOXONE_UNITS, PAUSE_CAUSES } from './pca-pause.js';

const moment = z.string();
const setting = z.number().nullable();

export const pcaPauseSchema = z.object({
  id: z.number().int(),
  cause: z.enum(PAUSE_CAUSES),
  reason: z.string(),
  pausedAt: moment,
  pausedByName: z.string(),
  naloxoneDose: z.number().nullable(),
  naloxoneUnit: z.enum(NALOXONE_UNITS).nullable(),
  naloxoneGivenAt: moment.nullable(),
  resumedAt: moment.nullable(),
  resumedByName: z.string().nullable(),
  resumeWitnessName: z.string().nullable(),
  resumeReason: z.string().nullable(),
});
export type PcaPause = z.infer<typeof pcaPauseSchema>;

/**
 * Whether a PCA is paused, its pauses newest first, and until when the after-naloxone watch runs.
 * After a resume attempt, `differences` lists each pump setting either nurse read differently from
 * the order (empty when they matched and the PCA resumed).
 */
export const pcaPauseStateSchema = answer(
  'PcaPauseState',
  z.object({
    orderId: z.number().int(),
    paused: z.boolean(),
    pauses: z.array(pcaPauseSchema),
    naloxoneWatchUntil: moment.nullable(),
    /** How often to observe during the watch: the ward's close-observation interval. */
    naloxoneWatchEveryMinutes: z.number().int(),
    differences: z.array(
      z.object({
        field: z.enum(PUMP_SETTING_FIELDS as readonly (keyof PumpSettings)[] as [keyof PumpSettings, ...(keyof PumpSettings)[]]),
        first: setting,
        second: setting,
        ordered: setting,
        differs: z.enum(['first', 'second', 'both']),
      }),
    ),
  }),
);
export type PcaPauseState = z.infer<typeof pcaPauseStateSchema>;
