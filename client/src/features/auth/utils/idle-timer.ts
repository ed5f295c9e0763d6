/** How long a tab may sit unused, and how long before that the warning shows. */
export interface IdleTiming {
  timeoutMs: number;
  warningMs: number;
}

export type IdlePhase = 'active' | 'warning' | 'expired';

export interface IdleState {
  phase: IdlePhase;
  /** Until sign-out; 0 once expired. */
  msLeft: number;
}

const MINUTE_MS = 60_000;

/** The warning comes a minute before sign-out, or halfway for a timeout under two minutes. */
export function idleTiming(minutes: number): IdleTiming {
  const timeoutMs = Math.round(minutes * MINUTE_MS);
  return { timeoutMs, warningMs: Math.min(MINUTE_MS, Math.floor(timeoutMs / 2)) };
}

/**
 * Where a tab stands, from the last activity and the clock alone, so a computer that slept
 * through the timeout signs out as soon as it wakes.
 */
export function idleState(lastActivityAt: number, now: number, timing: IdleTiming): IdleState {
  const msLeft = Math.max(0, timing.timeoutMs - Math.max(0, now - lastActivityAt));
  if (msLeft === 0) return { phase: 'expired', msLeft: 0 };
  return { phase: msLeft <= timing.warningMs ? 'warning' : 'active', msLeft };
}

/** "0:59", "1:00": the seconds shown counting down. */
export function formatCountdown(msLeft: number): string {
  const seconds = Math.max(0, Math.ceil(msLeft / 1000));
  return `${Math.floor(seconds / 60)}:${String(seconds % 60).padStart(2, '0')}`;
}

/** "15 minutes", "1 minute", "90 seconds". */
export function formatIdleDuration(ms: number): string {
  if (ms % MINUTE_MS !== 0) return `${Math.round(ms / 1000)} seconds`;
  const minutes = ms / MINUTE_MS;
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}
