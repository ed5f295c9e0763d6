import type { DoseUnit } from '../drugs/drug.schema.js';

// Metric definitions; cross-checked against UCUM (@lhncbc/ucum-lhc) in units.spec.ts.
export const MCG_PER_MG = 1000;
export const MINUTES_PER_HOUR = 60;
export const MS_PER_HOUR = 3_600_000;

/** `amount` in `from` expressed in `to` (mg ↔ mcg). */
export function convertDoseUnit(amount: number, from: DoseUnit, to: DoseUnit): number {
  if (from === to) return amount;
  return from === 'mg' ? amount * MCG_PER_MG : amount / MCG_PER_MG;
}

/**
 * Display unit → UCUM code for storage and exchange (e.g. FHIR). Lockstep displays "mcg" but
 * "mcg" is not a UCUM code; UCUM's microgram is "ug".
 */
export const UCUM_CODES = {
  mg: 'mg',
  mcg: 'ug',
  mL: 'mL',
  'mg/mL': 'mg/mL',
  'mcg/mL': 'ug/mL',
  'mg/h': 'mg/h',
  'mcg/h': 'ug/h',
  'mL/h': 'mL/h',
  'mg/kg': 'mg/kg',
  'mcg/kg': 'ug/kg',
  'mg/kg/h': 'mg/kg/h',
  'mcg/kg/h': 'ug/kg/h',
  min: 'min',
  h: 'h',
  kg: 'kg',
} as const;

export type DisplayUnit = keyof typeof UCUM_CODES;
