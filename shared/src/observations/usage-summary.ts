import { withoutFloatNoise } from '../dose/float-noise.js';
import { oralMorphineEquivalent, type OralMorphineConversion } from '../dose/oral-morphine-equivalent.js';
import type { PumpReading } from '../dose/types.js';
import { usageBetween } from '../dose/usage-between.js';
import type { DoseUnit } from '../drugs/drug.schema.js';

/** A cumulative pump reading of one syringe; each syringe starts with a zero reading at its start. */
export type SyringeReading = PumpReading & { syringeId: number };
export type BolusEntry = { at: string; amount: number };

export type UsageBucket = { start: string; attempts: number; delivered: number; dose: number; bolusDose: number };

export type UsageSummary = {
  hours: number;
  buckets: UsageBucket[];
  totals: { attempts: number; delivered: number; dose: number; bolusDose: number };
  rolling24hDose: number;
  averageDosePerHour: number;
  /** Null when pharmacy has set no conversion factor for the drug (never 0). */
  oralMorphineEquivalent24hMg: number | null;
};

const HOUR = 3_600_000;

/**
 * Hourly use over the last `hours` from consecutive readings of the same syringe (each difference
 * counts in the hour of the later reading) plus clinician boluses; the 24-hour rolling total,
 * and that total as oral morphine for step-down planning (always shown with the cross-tolerance caution
 * and the factors used). `conversion` is the order's drug's row of pharmacy's equianalgesic table
 * (`conversionFor`), or null when there is none: then there is no oral-morphine figure.
 */
export function usageSummary(
  readings: readonly SyringeReading[],
  boluses: readonly BolusEntry[],
  order: { concentrationPerMl: number; doseUnit: DoseUnit; conversion: OralMorphineConversion | null },
  now: Date,
  hours: number,
): UsageSummary {
  const end = Math.ceil(now.getTime() / HOUR) * HOUR;
  const windowStart = end - hours * HOUR;
  const buckets: UsageBucket[] = Array.from({ length: hours }, (_, i) => ({
    start: new Date(windowStart + i * HOUR).toISOString(),
    attempts: 0,
    delivered: 0,
    dose: 0,
    bolusDose: 0,
  }));
  const bucketAt = (time: number) => (time >= windowStart && time < end ? buckets[Math.floor((time - windowStart) / HOUR)] : undefined);
  const since24h = now.getTime() - 24 * HOUR;
  let rolling = 0;

  const sorted = [...readings].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  for (let i = 1; i < sorted.length; i++) {
    const [a, b] = [sorted[i - 1], sorted[i]];
    if (a.syringeId !== b.syringeId) continue;
    const use = usageBetween(a, b);
    if (![use.attempts, use.delivered, use.volumeMl].every(Number.isFinite)) continue;
    const dose = use.volumeMl * order.concentrationPerMl;
    const time = Date.parse(b.at);
    if (time > since24h && time <= now.getTime()) rolling += dose;
    const bucket = bucketAt(time);
    if (bucket) {
      bucket.attempts += use.attempts;
      bucket.delivered += use.delivered;
      bucket.dose = withoutFloatNoise(bucket.dose + dose);
    }
  }
  for (const bolus of boluses) {
    const time = Date.parse(bolus.at);
    if (time > since24h && time <= now.getTime()) rolling += bolus.amount;
    const bucket = bucketAt(time);
    if (bucket) bucket.bolusDose = withoutFloatNoise(bucket.bolusDose + bolus.amount);
  }

  const totals = buckets.reduce(
    (sum, bucket) => ({
      attempts: sum.attempts + bucket.attempts,
      delivered: sum.delivered + bucket.delivered,
      dose: withoutFloatNoise(sum.dose + bucket.dose),
      bolusDose: withoutFloatNoise(sum.bolusDose + bucket.bolusDose),
    }),
    { attempts: 0, delivered: 0, dose: 0, bolusDose: 0 },
  );
  const rolling24hDose = withoutFloatNoise(rolling);
  const oral = order.conversion ? oralMorphineEquivalent(rolling24hDose, order.doseUnit, order.conversion) : Number.NaN;
  return {
    hours,
    buckets,
    totals,
    rolling24hDose,
    averageDosePerHour: withoutFloatNoise((totals.dose + totals.bolusDose) / hours),
    oralMorphineEquivalent24hMg: Number.isFinite(oral) ? oral : null,
  };
}
