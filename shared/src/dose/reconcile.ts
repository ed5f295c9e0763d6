import { roundTo } from './float-noise.js';

export type Reconciliation = { discrepancyMl: number; mustReport: boolean };

// A thousandth of a mL is finer than any syringe scale and matches what formatDose shows.
const DISCREPANCY_DECIMALS = 3;

/**
 * Controlled-drug reconciliation at the end of a syringe: dispensed − infused − wasted, signed
 * (positive: drug unaccounted for; negative: more accounted for than dispensed). It must be
 * reported when its size is above the tolerance. A reconciliation that cannot be worked out (a
 * negative or non-finite volume) gives NaN and must be reported; a negative or missing tolerance
 * counts as 0.
 */
export function reconcile(dispensedMl: number, infusedMl: number, wastedMl: number, toleranceMl: number): Reconciliation {
  const volumes = [dispensedMl, infusedMl, wastedMl];
  if (volumes.some((volume) => !Number.isFinite(volume) || volume < 0)) {
    return { discrepancyMl: Number.NaN, mustReport: true };
  }
  const discrepancyMl = roundTo(dispensedMl - infusedMl - wastedMl, DISCREPANCY_DECIMALS);
  const tolerance = Number.isFinite(toleranceMl) && toleranceMl > 0 ? toleranceMl : 0;
  return { discrepancyMl, mustReport: Math.abs(discrepancyMl) > tolerance };
}
