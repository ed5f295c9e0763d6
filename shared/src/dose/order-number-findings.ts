import { REGIMEN_FIELD_LABELS } from './regimen-fields.js';
import type { Finding, Regimen, RegimenField } from './types.js';

export type NumericOrderField = RegimenField | 'concentrationPerMl';

const LABELS: Readonly<Record<NumericOrderField, string>> = {
  concentrationPerMl: 'Concentration',
  ...REGIMEN_FIELD_LABELS,
};

const REQUIRED: ReadonlySet<NumericOrderField> = new Set(['concentrationPerMl', 'demandDose', 'lockoutMinutes', 'basalRatePerHour']);

const NUMERIC_FIELDS = Object.keys(LABELS) as NumericOrderField[];

function error(field: NumericOrderField, code: string, message: string): Finding {
  return { field, severity: 'error', code, message };
}

// Typed as unknown: orders arrive from forms and request bodies, where a "number" may be anything.
function numberFinding(field: NumericOrderField, value: unknown): Finding | null {
  const label = LABELS[field];
  if (value === null || value === undefined) {
    return REQUIRED.has(field) ? error(field, 'number.missing', `${label} is required`) : null;
  }
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    return error(field, 'number.not-finite', `${label} must be a number`);
  }
  if (value < 0) return error(field, 'number.negative', `${label} cannot be negative`);
  if (field === 'concentrationPerMl' && value === 0) {
    return error(field, 'concentration.not-positive', 'Concentration must be more than 0');
  }
  return null;
}

/**
 * Errors for numbers that cannot be right: a required number missing, NaN or Infinity, a
 * negative number, a concentration of 0. Optional fields left null or undefined are not checked.
 */
export function invalidNumberFindings(r: Regimen): Finding[] {
  return NUMERIC_FIELDS.map((field) => numberFinding(field, r[field])).filter((finding): finding is Finding => finding !== null);
}

/** Whether a regimen value can be used in arithmetic and limit checks. */
export function isUsableNumber(value: number | null | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value >= 0;
}
