import { roundTo, withoutFloatNoise } from './float-noise.js';
import { normaliseUnit } from './normalise-unit.js';

const MAX_DECIMALS = 3;
/** Significant figures kept for an amount below 1 that 3 decimals would round away. */
const SMALL_AMOUNT_SIGNIFICANT_FIGURES = 3;
const MCG_PER_MG = 1000;
/** The most fraction digits every Intl.NumberFormat accepts (Node 20's accepts no more than 20). */
const MOST_DECIMALS = 20;

/** Shown for a value that is not a finite number, so no plausible-looking dose appears. */
export const NOT_A_NUMBER_DISPLAY = '—';

// en-US digits and grouping whatever the browser locale: a dose must read the same on every
// screen. 'negative' hides the sign of -0.
const formats = new Map<number, Intl.NumberFormat>();
function numberFormat(decimals: number): Intl.NumberFormat {
  let format = formats.get(decimals);
  if (!format) {
    format = new Intl.NumberFormat('en-US', { maximumFractionDigits: decimals, useGrouping: true, signDisplay: 'negative' });
    formats.set(decimals, format);
  }
  return format;
}

function losesDigits(amount: number, decimals: number): boolean {
  return roundTo(amount, decimals) !== withoutFloatNoise(amount);
}

// Decimals enough to show 3 significant figures of an amount below 1 (0.000123 needs 6), never
// fewer than 3: so no amount that is not 0 is ever shown as 0.
function decimalsFor(amount: number): number {
  const size = Math.abs(amount);
  if (size === 0 || size >= 1 || !losesDigits(amount, MAX_DECIMALS)) return MAX_DECIMALS;
  const leadingZeros = -Math.floor(Math.log10(size)) - 1;
  return Math.min(MOST_DECIMALS, Math.max(MAX_DECIMALS, leadingZeros + SMALL_AMOUNT_SIGNIFICANT_FIGURES));
}

function withUnit(number: string, unit: string): string {
  return unit === '' ? number : `${number} ${unit}`;
}

/**
 * Safe display of an amount per the ISMP List of Error-Prone Abbreviations, Symbols, and Dose
 * Designations: leading zero ('0.5 mg'), no trailing zero ('1 mg'), commas from 1,000, 'mcg'
 * and 'mL'. At most 3 decimals, rounded half away from zero, with two exceptions so that no
 * amount that is not 0 is ever shown as 0:
 * - an amount in mg below 1 mg that 3 decimals would not show exactly is shown in mcg
 *   (0.0125 mg → '12.5 mcg'; 0.0004 mg → '0.4 mcg'), as ISMP advises mcg for sub-milligram
 *   amounts. An amount in mg that 3 decimals show exactly keeps the order's own unit
 *   ('0.05 mg'), because the pump is programmed in that unit;
 * - any other amount below 1 that 3 decimals would round keeps 3 significant figures
 *   ('0.000123 mcg', '-0.0001 mL').
 * A negative amount keeps its '-' sign (a reconciliation shortfall is negative); a non-finite
 * amount is '—' with no unit.
 */
export function formatDose(amount: number, unit: string): string {
  if (!Number.isFinite(amount)) return NOT_A_NUMBER_DISPLAY;
  let safeUnit = normaliseUnit(unit);
  let shown = amount;
  const [first, ...rest] = safeUnit.split('/');
  if (first === 'mg' && Math.abs(amount) < 1 && losesDigits(amount, MAX_DECIMALS)) {
    shown = amount * MCG_PER_MG;
    safeUnit = ['mcg', ...rest].join('/');
  }
  const decimals = decimalsFor(shown);
  const rounded = roundTo(shown, decimals);
  // Beyond 20 decimals (float dust, not a dose) say how small rather than print 0.
  if (rounded === 0 && shown !== 0) return withUnit(`${shown < 0 ? '> -' : '< '}0.${'0'.repeat(MOST_DECIMALS - 1)}1`, safeUnit);
  return withUnit(numberFormat(decimals).format(rounded), safeUnit);
}

// Digits of a finite number as stored (the shortest text that reads back as the same double),
// written out without an exponent: 1e-7 → '0.0000001', 1.5e21 → '1500000000000000000000'.
function plainDigits(value: number): string {
  const text = String(Math.abs(value));
  const match = /^(\d)(?:\.(\d+))?e([+-]\d+)$/.exec(text);
  if (!match) return text;
  const [, head, tail = '', exponentText] = match;
  const digits = head + tail;
  const exponent = Number(exponentText);
  if (exponent < 0) return `0.${'0'.repeat(-exponent - 1)}${digits}`;
  return digits.length > exponent + 1 ? `${digits.slice(0, exponent + 1)}.${digits.slice(exponent + 1)}` : digits.padEnd(exponent + 1, '0');
}

/**
 * A limit as stored, never rounded: every digit of the stored number (0.0125 mg/kg stays
 * '0.0125 mg/kg', 0.00001 stays '0.00001'), with the same safe spelling as `formatDose` (leading
 * zero, no trailing zero, commas from 1,000, 'mcg', 'mL'; ISMP List of Error-Prone Abbreviations,
 * Symbols, and Dose Designations) and no exponent. Kept in its own unit: a limit is read against
 * the library, which is written in that unit. A non-finite limit is '—'.
 */
export function formatLimit(amount: number, unit: string): string {
  if (!Number.isFinite(amount)) return NOT_A_NUMBER_DISPLAY;
  const [whole, fraction] = plainDigits(amount).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const sign = amount < 0 ? '-' : '';
  return withUnit(`${sign}${grouped}${fraction ? `.${fraction}` : ''}`, normaliseUnit(unit));
}
