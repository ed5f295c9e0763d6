import { type PossibleTotalsOptions, possibleTotals } from './possible-totals.js';
import type { Regimen } from './types.js';

/**
 * Most drug in any hour, the first included: basal + demand × ceil(60 ÷ lockout) + the clinician
 * boluses allowed, plus the loading dose, capped by the 1-hour and the 4-hour limit. The same
 * figure the order check compares with the rule (`possibleTotals`, first hour).
 */
export function maxHourlyDose(r: Regimen, options: PossibleTotalsOptions = {}): number {
  return possibleTotals(r, options).firstHour.dose;
}
