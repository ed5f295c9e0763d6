import { type PossibleTotalsOptions, possibleTotals } from './possible-totals.js';
import type { Regimen } from './types.js';

/**
 * Most drug in any 4 hours, the first included: 4 × basal + demand × ceil(240 ÷ lockout) + the
 * clinician boluses allowed, plus the loading dose, capped by the 4-hour limit and 4 × the 1-hour
 * limit. The same figure the order check compares with the rule (`possibleTotals`, first 4 hours).
 */
export function maxFourHourDose(r: Regimen, options: PossibleTotalsOptions = {}): number {
  return possibleTotals(r, options).firstFourHours.dose;
}
