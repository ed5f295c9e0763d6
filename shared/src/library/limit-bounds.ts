import { REGIMEN_FIELD_LABELS } from '../dose/regimen-fields.js';
import type { RegimenField } from '../dose/types.js';

/**
 * Input bounds for a dose-limit library: what a limit may be at all, so that a mistyped or
 * overlong value is refused instead of stored. These are Lockstep's own sanity bounds on input,
 * not clinical limits (no published source sets them; they only need to sit far above any real
 * PCA limit and keep every value a finite number). Documented in docs/library-csv.md.
 */
/** Doses, rates and 1- and 4-hour limits, in the rule's dose unit (per kg with per kg). */
export const MAX_DOSE_LIMIT = 10_000;
/** A lockout longer than a day is no PCA lockout. */
export const MAX_LOCKOUT_MINUTES = 1_440;
/** Concentration of a prepared syringe, in dose unit per mL. */
export const MAX_CONCENTRATION_PER_ML = 10_000;
/** The most rules a version holds, whether written as JSON or imported from CSV. */
export const LIBRARY_MAX_RULES = 500;

export function maxLimitFor(field: RegimenField): number {
  return field === 'lockoutMinutes' ? MAX_LOCKOUT_MINUTES : MAX_DOSE_LIMIT;
}

/**
 * Why a limit value cannot be stored, or null when it can: it must be a finite number from 0 to
 * the field's bound. `label` names the field as the caller's reader knows it.
 */
export function limitValueProblem(field: RegimenField, value: number, label: string = REGIMEN_FIELD_LABELS[field]): string | null {
  if (!Number.isFinite(value)) return `${label}: a limit must be a finite number`;
  if (value < 0) return `${label}: a limit must be 0 or more`;
  const max = maxLimitFor(field);
  if (value > max) {
    return `${label}: a limit is at most ${plainDecimal(max)} ${field === 'lockoutMinutes' ? 'minutes' : '(in the dose unit)'}; this is ${plainDecimal(value)}`;
  }
  return null;
}

/** Why a concentration cannot be stored, or null. */
export function concentrationProblem(value: number): string | null {
  if (!Number.isFinite(value) || value <= 0) return 'Concentration must be a number more than 0';
  if (value > MAX_CONCENTRATION_PER_ML)
    return `Concentration is at most ${plainDecimal(MAX_CONCENTRATION_PER_ML)} per mL; this is ${plainDecimal(value)}`;
  return null;
}

/**
 * A finite number written as a plain decimal, never with an exponent (1e-7 → "0.0000001",
 * 1e21 → "1000000000000000000000"), with the same shortest digits JavaScript would write, so
 * that reading it back gives exactly the same number.
 */
export function plainDecimal(value: number): string {
  if (!Number.isFinite(value)) throw new RangeError(`${value} is not a finite number`);
  const text = String(value);
  if (!text.includes('e')) return text;
  const [mantissa, exponentText] = text.split('e');
  const negative = mantissa.startsWith('-');
  const [whole, fraction = ''] = (negative ? mantissa.slice(1) : mantissa).split('.');
  const digits = whole + fraction;
  const point = whole.length + Number(exponentText);
  let plain: string;
  if (point <= 0) plain = `0.${'0'.repeat(-point)}${digits}`;
  else if (point >= digits.length) plain = digits + '0'.repeat(point - digits.length);
  else plain = `${digits.slice(0, point)}.${digits.slice(point)}`;
  return negative ? `-${plain}` : plain;
}
