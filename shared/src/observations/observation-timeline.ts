import type { FieldError } from '../api/api-error.schema.js';

export const PUMP_TOTAL_FIELDS = ['attempts', 'delivered', 'volumeInfusedMl'] as const;
export type PumpTotalField = (typeof PUMP_TOTAL_FIELDS)[number];
export type PumpTotals = Record<PumpTotalField, number>;

/** A device clock a little ahead of the server's is not "the future". One minute: Lockstep's own allowance, not a clinical value. */
export const OBSERVATION_CLOCK_SKEW_MS = 60_000;

type Reading = PumpTotals & { releaseId: number; at: string };

/** The same syringe's observations just before (or at) and just after `at`: the new totals lie between them. */
export function pumpTotalsAround<T extends Reading>(
  observations: readonly T[],
  releaseId: number | null,
  at: Date,
): { before: T | null; after: T | null } {
  const time = at.getTime();
  const sameSyringe = observations
    .filter((observation) => observation.releaseId === releaseId)
    .sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  return {
    before: sameSyringe.filter((observation) => Date.parse(observation.at) <= time).at(-1) ?? null,
    after: sameSyringe.find((observation) => Date.parse(observation.at) > time) ?? null,
  };
}

export type ObservationTimeline = {
  at: Date;
  values: PumpTotals & { syringeRemainingMl: number };
  before: PumpTotals | null;
  after: PumpTotals | null;
  /** What the running syringe held; null when none is known. */
  syringeVolumeMl: number | null;
  startedAt: Date | null;
  now: Date;
};

/**
 * Whether an observation fits its PCA's timeline: not in the future, not before the start, pump
 * totals that never go down within one syringe (nor above a later observation's), no more doses
 * delivered than attempted, and no more out of (or left in) the syringe than it held.
 */
export function observationTimelineErrors(timeline: ObservationTimeline): FieldError[] {
  const { at, values, before, after, syringeVolumeMl, startedAt, now } = timeline;
  const errors: FieldError[] = [];
  if (at.getTime() > now.getTime() + OBSERVATION_CLOCK_SKEW_MS)
    errors.push({ field: 'at', message: 'An observation cannot be in the future' });
  else if (startedAt && at.getTime() < startedAt.getTime())
    errors.push({ field: 'at', message: 'An observation cannot be before the PCA started' });
  for (const field of PUMP_TOTAL_FIELDS) {
    if (before && values[field] < before[field]) {
      errors.push({ field, message: `At least ${before[field]}: pump totals never go down within one syringe` });
    } else if (after && values[field] > after[field]) {
      errors.push({ field, message: `At most ${after[field]}: a later observation of this syringe has ${after[field]}` });
    }
  }
  if (values.delivered > values.attempts && !errors.some((error) => error.field === 'delivered')) {
    errors.push({ field: 'delivered', message: 'More doses delivered than attempts: check the pump' });
  }
  if (syringeVolumeMl !== null) {
    if (values.volumeInfusedMl > syringeVolumeMl && !errors.some((error) => error.field === 'volumeInfusedMl')) {
      errors.push({ field: 'volumeInfusedMl', message: `More than the ${syringeVolumeMl} mL the syringe held: check the pump` });
    }
    if (values.syringeRemainingMl > syringeVolumeMl) {
      errors.push({ field: 'syringeRemainingMl', message: `More than the ${syringeVolumeMl} mL the syringe held: check the syringe` });
    }
  }
  return errors;
}
