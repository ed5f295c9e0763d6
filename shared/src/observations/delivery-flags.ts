import { formatDose } from '../dose/format-dose.js';
import type { FlagDraft, ObservationValues, PreviousReading } from './observation-flags.js';

/** What the order allows, in its dose unit (doses and limits) and mL. */
export type DeliveryRegimen = {
  doseUnit: string;
  demandDose: number;
  lockoutMinutes: number;
  basalRatePerHour: number;
  concentrationPerMl: number;
  oneHourLimit: number | null;
  fourHourLimit: number | null;
};

// Volume infused against doses × volume per dose + basal × time: the larger of 1 mL or 10 % of
// what the doses explain. Lockstep's own tolerance (common practice for reading a pump's
// cumulative volume), not a published value; clinician boluses given in between are added first.
export const VOLUME_TOLERANCE_ML = 1;
export const VOLUME_TOLERANCE_FRACTION = 0.1;

const MS_PER_MINUTE = 60_000;

/** Most demand doses a pump can give in a closed window of this many minutes: floor(window ÷ lockout) + 1. */
export function mostDemandsBetweenReadings(lockoutMinutes: number, minutes: number): number {
  if (!(lockoutMinutes > 0) || !(minutes >= 0)) return Infinity;
  // A press just after one reading and one every lockout after it: floor + 1 (the order's ceil(window ÷ lockout)
  // counts a window open at one end; a window between two readings is closed at both).
  return Math.floor(minutes / lockoutMinutes + 1e-9) + 1;
}

/**
 * Delivered more than the regimen allows (urgent): more demand doses since the previous reading
 * than the lockout permits, or the demand doses and basal in any window ending now over the
 * order's 1-hour or 4-hour limit (`earlier`: this syringe's readings, its start included).
 * Volume infused inconsistent with the doses (review). Clinician boluses and the loading dose are
 * not counted against the limits here (the order check counts them when the order is signed).
 */
export function deliveryFlags(
  current: Pick<ObservationValues, 'at' | 'delivered' | 'volumeInfusedMl'>,
  previous: PreviousReading,
  earlier: readonly PreviousReading[],
  regimen: DeliveryRegimen,
  otherMlSincePrevious = 0,
): FlagDraft[] {
  const flags: FlagDraft[] = [];
  const unit = regimen.doseUnit;
  const reasons: string[] = [];
  const at = Date.parse(current.at);
  const minutes = (at - Date.parse(previous.at)) / MS_PER_MINUTE;
  const doses = current.delivered - previous.delivered;
  const most = mostDemandsBetweenReadings(regimen.lockoutMinutes, minutes);
  if (doses > most) {
    reasons.push(`${doses} doses in ${Math.max(0, Math.round(minutes))} min (lockout ${regimen.lockoutMinutes} min allows ${most})`);
  }
  const windows: [number | null, number, string][] = [
    [regimen.oneHourLimit, 60, '1-hour'],
    [regimen.fourHourLimit, 240, '4-hour'],
  ];
  for (const [limit, windowMinutes, label] of windows) {
    if (limit === null || !Number.isFinite(limit)) continue;
    let worst = 0;
    for (const reading of [previous, ...earlier]) {
      const since = (at - Date.parse(reading.at)) / MS_PER_MINUTE;
      if (since < 0 || since > windowMinutes) continue;
      const given = (current.delivered - reading.delivered) * regimen.demandDose + (regimen.basalRatePerHour * since) / 60;
      worst = Math.max(worst, given);
    }
    if (worst > limit)
      reasons.push(
        `${formatDose(worst, unit)} within ${label === '1-hour' ? 'an hour' : '4 hours'}, over the ${label} limit of ${formatDose(limit, unit)}`,
      );
  }
  if (reasons.length > 0) {
    flags.push({
      severity: 'urgent',
      code: 'delivery.over-regimen',
      message: `Delivered more than the regimen allows: ${reasons.join('; ')}`,
      action:
        'Check the pump and the entry: compare the pump’s settings and totals with the order, and correct the observation if it was entered wrongly',
    });
  }
  if (regimen.concentrationPerMl > 0 && minutes >= 0) {
    const expectedMl =
      (doses * regimen.demandDose + (regimen.basalRatePerHour * minutes) / 60) / regimen.concentrationPerMl +
      Math.max(0, otherMlSincePrevious);
    const infusedMl = current.volumeInfusedMl - previous.volumeInfusedMl;
    const tolerance = Math.max(VOLUME_TOLERANCE_ML, VOLUME_TOLERANCE_FRACTION * expectedMl);
    if (Math.abs(infusedMl - expectedMl) > tolerance) {
      flags.push({
        severity: 'review',
        code: 'delivery.volume-mismatch',
        message: `${formatDose(infusedMl, 'mL')} infused since the last reading; the doses and basal explain ${formatDose(expectedMl, 'mL')}`,
        action: 'Check the pump’s volume and dose totals and the entry; check the line for a leak or a disconnection',
      });
    }
  }
  return flags;
}

/**
 * A total given in a window at or over the order's limit for that window (the board's 4-hour
 * figure against the 4-hour limit). No limit stated: false (the order check held the regimen to
 * the ward's rule when it was signed). A total that is not a finite number is never taken as safe.
 */
export function atOrOverLimit(total: number, limit: number | null): boolean {
  if (!Number.isFinite(total)) return true;
  if (limit === null) return false;
  return !(total < limit);
}
