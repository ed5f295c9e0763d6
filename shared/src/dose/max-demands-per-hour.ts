import { withoutFloatNoise } from './float-noise.js';
import { MINUTES_PER_HOUR } from './units.js';

/**
 * Most demand doses that can be delivered inside a window of `windowMinutes` with a lockout of
 * `lockoutMinutes`: ceil(window ÷ lockout), because the first demand can fall at the very start
 * of the window. A lockout of 0 or less gives Infinity (nothing limits demands); NaN stays NaN.
 */
export function maxDemandsInWindow(lockoutMinutes: number, windowMinutes: number): number {
  if (Number.isNaN(lockoutMinutes) || Number.isNaN(windowMinutes)) return Number.NaN;
  if (lockoutMinutes <= 0) return Infinity;
  // Noise removal first, so 60 ÷ (60 ÷ 7) counts 7 demands, not 8.
  return Math.ceil(withoutFloatNoise(windowMinutes / lockoutMinutes));
}

/** Most demand doses in any 60-minute window: ceil(60 ÷ lockout). */
export function maxDemandsPerHour(lockoutMinutes: number): number {
  return maxDemandsInWindow(lockoutMinutes, MINUTES_PER_HOUR);
}
