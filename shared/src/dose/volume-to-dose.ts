import { withoutFloatNoise } from './float-noise.js';

/**
 * Dose (in the drug's dosing unit) held in `volumeMl` at `concentrationPerMl`, e.g. for pump
 * volume infused. NaN for a negative or non-finite volume or a concentration not above 0.
 */
export function volumeToDose(volumeMl: number, concentrationPerMl: number): number {
  if (!Number.isFinite(volumeMl) || volumeMl < 0) return Number.NaN;
  if (!Number.isFinite(concentrationPerMl) || concentrationPerMl <= 0) return Number.NaN;
  return withoutFloatNoise(volumeMl * concentrationPerMl);
}
