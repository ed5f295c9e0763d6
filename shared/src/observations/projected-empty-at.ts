import { hoursUntilEmpty } from '../dose/hours-until-empty.js';

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
  const demandMlPerHour = before && hours > 0 ? Math.max(0, (last.volumeInfusedMl - before.volumeInfusedMl) / hours - basalMlPerHour) : 0;
  const left = hoursUntilEmpty(remainingMl, basalMlPerHour, demandMlPerHour);
  return Number.isFinite(left) ? new Date(Date.parse(last.at) + left * 3_600_000).toISOString() : null;
}
