import { withoutFloatNoise } from './float-noise.js';
import { maxDemandsInWindow } from './max-demands-per-hour.js';
import { MINUTES_PER_HOUR } from './units.js';
import type { Regimen } from './types.js';

type WindowRegimen = Pick<Regimen, 'demandDose' | 'lockoutMinutes' | 'basalRatePerHour'>;

/**
 * Most drug a regimen can deliver in `windowMinutes` from basal and demand doses, before any
 * hourly limit: basal × hours + demand × ceil(window ÷ lockout).
 */
export function uncappedWindowDose(r: WindowRegimen, windowMinutes: number): number {
  const demands = maxDemandsInWindow(r.lockoutMinutes, windowMinutes);
  // 0 × Infinity is NaN: a zero demand dose adds nothing whatever the lockout.
  const demandTotal = r.demandDose === 0 ? 0 : r.demandDose * demands;
  return withoutFloatNoise((r.basalRatePerHour * windowMinutes) / MINUTES_PER_HOUR + demandTotal);
}

/** The smaller of `dose` and `limit`; an absent (null/undefined) limit caps nothing. */
export function capByLimit(dose: number, limit: number | null | undefined): number {
  return limit === null || limit === undefined ? dose : Math.min(dose, limit);
}

/** Most drug in any hour: basal + demand × maxDemandsPerHour, capped by the 1-hour limit. */
export function maxHourlyDose(r: Regimen): number {
  return capByLimit(uncappedWindowDose(r, MINUTES_PER_HOUR), r.oneHourLimit);
}
