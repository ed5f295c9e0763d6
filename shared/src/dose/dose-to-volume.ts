import { withoutFloatNoise } from './float-noise.js';

/**
 * Volume in mL that holds `dose` at `concentrationPerMl` (both in the same dosing unit).
 * NaN for a negative or non-finite dose or a concentration that is not above 0: a volume that
 * cannot be right is shown as "—" by formatDose rather than as a plausible number.
 */
export function doseToVolumeMl(dose: number, concentrationPerMl: number): number {
  if (!Number.isFinite(dose) || dose < 0) return Number.NaN;
  if (!Number.isFinite(concentrationPerMl) || concentrationPerMl <= 0) return Number.NaN;
  return withoutFloatNoise(dose / concentrationPerMl);
}
