import type { DoseUnit } from '../drugs/drug.schema.js';
import { withoutFloatNoise } from './float-noise.js';
import { convertDoseUnit } from './units.js';

/** The parenteral morphine dose every equianalgesic factor is measured against. */
export const REFERENCE_PARENTERAL_MORPHINE_MG = 10;

/**
 * The two factors one conversion uses, both read from pharmacy's equianalgesic table
 * (`equianalgesic_factors`, edited on the pharmacy screen) by the order's formulary drug id:
 * how much of the drug, given parenterally, is taken as equal to 10 mg parenteral morphine, and
 * how much oral morphine is taken as equal to 10 mg parenteral morphine. No factor lives in this
 * file: the client and the server pass the same table's values, so they compute the same figure.
 */
export type OralMorphineConversion = {
  /** Parenteral amount of the drug taken as equal to 10 mg parenteral morphine, e.g. hydromorphone 2 mg. */
  parenteralAmount: number;
  parenteralUnit: DoseUnit;
  /** Oral morphine mg taken as equal to 10 mg parenteral morphine, e.g. 30. */
  oralMorphineMg: number;
};

const usableFactor = (value: number) => Number.isFinite(value) && value > 0;

/**
 * A parenteral amount (typically a 24-hour total) as oral morphine milligrams, for planning the
 * step down to oral analgesia: amount ÷ parenteral equivalent × oral morphine per 10 mg
 * parenteral morphine. A planning aid only: always show it with CROSS_TOLERANCE_CAUTION and the
 * factors used. NaN for a negative or non-finite amount, an unknown unit, or a factor that is not
 * a finite number above 0 (never 0, which would read as "no opioid").
 */
export function oralMorphineEquivalent(amount: number, unit: DoseUnit, conversion: OralMorphineConversion): number {
  if (!Number.isFinite(amount) || amount < 0) return Number.NaN;
  if (unit !== 'mg' && unit !== 'mcg') return Number.NaN;
  const { parenteralAmount, parenteralUnit, oralMorphineMg } = conversion;
  if (!usableFactor(parenteralAmount) || !usableFactor(oralMorphineMg)) return Number.NaN;
  if (parenteralUnit !== 'mg' && parenteralUnit !== 'mcg') return Number.NaN;
  const inFactorUnit = convertDoseUnit(amount, unit, parenteralUnit);
  return withoutFloatNoise((inFactorUnit / parenteralAmount) * oralMorphineMg);
}
