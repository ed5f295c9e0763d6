/** Why a PCA was paused: a nurse's decision, or naloxone given (which always pauses it). */
export const PAUSE_CAUSES = ['nurse', 'naloxone'] as const;
export type PauseCause = (typeof PAUSE_CAUSES)[number];

/** Naloxone is recorded in mcg or mg only (ISMP List of Error-Prone Abbreviations: mcg, not µg). */
export const NALOXONE_UNITS = ['mcg', 'mg'] as const;
export type NaloxoneUnit = (typeof NALOXONE_UNITS)[number];

/**
 * After naloxone: observations every 15 minutes for at least 2 hours. Naloxone's action is shorter
 * than that of many opioids, so sedation and slow breathing can return after it wears off: naloxone
 * hydrochloride injection, US prescribing information (FDA label), warning that "the duration of
 * action of some opioids may exceed that of naloxone" (from memory). The 15-minute interval and the
 * 2-hour span are common practice, not a single published figure.
 */
export const NALOXONE_WATCH = { everyMinutes: 15, forMinutes: 120 } as const;

/** Until when the after-naloxone watch runs, counted from the latest naloxone dose; null with none. */
export function naloxoneWatchUntil(naloxoneGivenAt: readonly (string | Date)[]): Date | null {
  let latest: number | null = null;
  for (const at of naloxoneGivenAt) {
    const time = new Date(at).getTime();
    if (!Number.isFinite(time)) continue;
    if (latest === null || time > latest) latest = time;
  }
  return latest === null ? null : new Date(latest + NALOXONE_WATCH.forMinutes * 60_000);
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
