import { withoutFloatNoise } from './float-noise.js';

/**
 * Hours until a syringe runs dry: remaining ÷ (basal + recent demand use), all in mL.
 * Infinity when nothing flows; 0 when nothing remains; NaN for a negative or non-finite rate
 * or a non-finite remaining volume, so a broken reading never looks like a safe one.
 */
export function hoursUntilEmpty(remainingMl: number, basalMlPerHour: number, recentDemandMlPerHour: number): number {
  const rates = [basalMlPerHour, recentDemandMlPerHour];
  if (!Number.isFinite(remainingMl) || rates.some((rate) => !Number.isFinite(rate) || rate < 0)) {
    return Number.NaN;
  }
  if (remainingMl <= 0) return 0;
  const flowMlPerHour = basalMlPerHour + recentDemandMlPerHour;
  if (flowMlPerHour === 0) return Infinity;
  return withoutFloatNoise(remainingMl / flowMlPerHour);
}
