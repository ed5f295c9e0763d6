import { capByLimit, uncappedWindowDose } from './max-hourly-dose.js';
import type { Regimen } from './types.js';

/** Most drug in any 4 hours: 4 × basal + demand × ceil(240 ÷ lockout), capped by the 4-hour limit. */
export function maxFourHourDose(r: Regimen): number {
  return capByLimit(uncappedWindowDose(r, 240), r.fourHourLimit);
}
