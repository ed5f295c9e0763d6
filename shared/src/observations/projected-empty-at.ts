import { hoursUntilEmpty } from '../dose/hours-until-empty.js';

// A demand rate from readings minutes apart swings wildly (2 mL in 30 s is 240 mL/h); below this
// gap only the basal rate is projected. 15 minutes is Lockstep's own choice, not a clinical value.
export const MIN_RATE_WINDOW_HOURS = 0.25;

type VolumeReading = { at: string; volumeInfusedMl: number };

/**
 * When the running syringe will be empty: what is left ÷ (basal + recent demand use), the recent
 * use being from the reading before the last (or the syringe's zero start) to the last. Null
 * when nothing flows or the readings cannot tell.
 */
export function projectedEmptyAt(syringeReadings: readonly VolumeReading[], remainingMl: number, basalMlPerHour: number): string | null {
  const last = syringeReadings.at(-1);
  if (!last) return null;
  const before = syringeReadings.at(-2);
  const hours = before ? (Date.parse(last.at) - Date.parse(before.at)) / 3_600_000 : 0;
  const demandMlPerHour =
    before && hours >= MIN_RATE_WINDOW_HOURS ? Math.max(0, (last.volumeInfusedMl - before.volumeInfusedMl) / hours - basalMlPerHour) : 0;
  const left = hoursUntilEmpty(remainingMl, basalMlPerHour, demandMlPerHour);
  return Number.isFinite(left) ? new Date(Date.parse(last.at) + left * 3_600_000).toISOString() : null;
}
