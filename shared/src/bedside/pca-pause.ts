import type { WardPolicy } from '../observations/ward-policy.js';

/** Why a PCA was paused: a nurse's decision, or naloxone given (which always pauses it). */
export const PAUSE_CAUSES = ['nurse', 'naloxone'] as const;
export type PauseCause = (typeof PAUSE_CAUSES)[number];

/** Naloxone is recorded in mcg or mg only (ISMP List of Error-Prone Abbreviations: mcg, not µg). */
export const NALOXONE_UNITS = ['mcg', 'mg'] as const;
export type NaloxoneUnit = (typeof NALOXONE_UNITS)[number];

/**
 * After naloxone: observations at the ward's close-observation interval (at most every 15 minutes) for the
 * ward's naloxone close period (at least 2 hours; both floors in WARD_POLICY_FLOORS). Naloxone's action is
 * shorter than that of many opioids, so sedation and slow breathing can return after it wears off:
 * naloxone hydrochloride injection, US prescribing information (FDA label), warning that "the duration of
 * action of some opioids may exceed that of naloxone" (from memory). The 15-minute interval and the
 * 2-hour span are common practice, not a single published figure.
 */
export function naloxoneWatch(policy: Pick<WardPolicy, 'closeObservationIntervalMinutes' | 'naloxoneClosePeriodMinutes'>): {
  everyMinutes: number;
  forMinutes: number;
} {
  return { everyMinutes: policy.closeObservationIntervalMinutes, forMinutes: policy.naloxoneClosePeriodMinutes };
}

/** "2 hours", "3 hours", "2.5 hours", "90 minutes": how long the after-naloxone watch runs, in words. */
export function naloxoneWatchSpan(forMinutes: number): string {
  if (forMinutes < 120) return `${forMinutes} minutes`;
  const hours = Math.round((forMinutes / 60) * 100) / 100;
  return `${hours} hours`;
}

/**
 * Until when the after-naloxone watch runs, counted from the latest naloxone dose for the ward's naloxone
 * close period; null with none.
 */
export function naloxoneWatchUntil(
  naloxoneGivenAt: readonly (string | Date)[],
  policy: Pick<WardPolicy, 'naloxoneClosePeriodMinutes'>,
): Date | null {
  let latest: number | null = null;
  for (const at of naloxoneGivenAt) {
    const time = new Date(at).getTime();
    if (!Number.isFinite(time)) continue;
    if (latest === null || time > latest) latest = time;
  }
  return latest === null ? null : new Date(latest + policy.naloxoneClosePeriodMinutes * 60_000);
}

/** A PCA is paused while one of its pauses has not been resumed. */
export function pcaPaused(pauses: readonly { resumedAt: string | Date | null }[]): boolean {
  return pauses.some((pause) => pause.resumedAt === null);
}

export type PauseAction = 'pause' | 'resume' | 'naloxone';

/**
 * What a nurse can do about pausing a running PCA: pause it or resume it (never both), and record
 * naloxone whether or not it is paused already. Anything but a running PCA allows none of them.
 */
export function pauseActions(running: boolean, paused: boolean): PauseAction[] {
  if (!running) return [];
  return paused ? ['resume', 'naloxone'] : ['pause', 'naloxone'];
}
