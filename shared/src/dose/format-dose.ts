import { roundTo } from './float-noise.js';
import { normaliseUnit } from './normalise-unit.js';

const MAX_DECIMALS = 3;

/** Shown for a value that is not a finite number, so no plausible-looking dose appears. */
export const NOT_A_NUMBER_DISPLAY = '—';

// en-US digits and grouping whatever the browser locale: a dose must read the same on every
// screen. 'negative' hides the sign of -0.
const numberFormat = new Intl.NumberFormat('en-US', {
  maximumFractionDigits: MAX_DECIMALS,
  useGrouping: true,
  signDisplay: 'negative',
});

/**
 * Safe display of an amount per the ISMP List of Error-Prone Abbreviations, Symbols, and Dose
 * Designations: leading zero ('0.5 mg'), no trailing zero ('1 mg'), commas from 1,000, 'mcg'
 * and 'mL'. At most 3 decimals, rounded half away from zero. A negative amount keeps its '-'
 * sign (a reconciliation shortfall is negative); a non-finite amount is '—' with no unit.
 */
export function formatDose(amount: number, unit: string): string {
  if (!Number.isFinite(amount)) return NOT_A_NUMBER_DISPLAY;
  const number = numberFormat.format(roundTo(amount, MAX_DECIMALS));
  const safeUnit = normaliseUnit(unit);
  return safeUnit === '' ? number : `${number} ${safeUnit}`;
}
