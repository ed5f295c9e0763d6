import type { DoseUnit } from '../drugs/drug.schema.js';
import { withoutFloatNoise } from './float-noise.js';
import { convertDoseUnit } from './units.js';

export type EquianalgesicDrug = 'morphine' | 'hydromorphone' | 'fentanyl';

// IV amounts taken as equal to 10 mg IV morphine. Morphine and fentanyl: NCI PDQ Cancer Pain,
// health professional version, equianalgesic table. Hydromorphone: Pennsylvania Patient Safety
// Advisory, 2007.
const IV_EQUIVALENT_OF_10_MG_IV_MORPHINE: Readonly<Record<EquianalgesicDrug, { amount: number; unit: DoseUnit }>> = {
  morphine: { amount: 10, unit: 'mg' },
  hydromorphone: { amount: 1.5, unit: 'mg' },
  fentanyl: { amount: 100, unit: 'mcg' },
};

// NCI PDQ Cancer Pain, health professional version, equianalgesic table: 10 mg IV morphine
// ≈ 30 mg oral morphine.
const ORAL_MORPHINE_MG_PER_10_MG_IV_MORPHINE = 30;

/**
 * An IV amount (typically a 24-hour total) as oral morphine milligrams, for planning the step
 * down to oral analgesia: IV morphine × 3, IV hydromorphone × 20 per mg, IV fentanyl × 0.3 per
 * mcg. A planning aid only: always show it with CROSS_TOLERANCE_CAUTION. NaN for a negative or
 * non-finite amount, or a drug not in the table.
 */
export function oralMorphineEquivalent(drug: EquianalgesicDrug, amount: number, unit: DoseUnit): number {
  const equivalent = IV_EQUIVALENT_OF_10_MG_IV_MORPHINE[drug];
  if (equivalent === undefined || !Number.isFinite(amount) || amount < 0) return Number.NaN;
  if (unit !== 'mg' && unit !== 'mcg') return Number.NaN;
  const inTableUnit = convertDoseUnit(amount, unit, equivalent.unit);
  return withoutFloatNoise((inTableUnit / equivalent.amount) * ORAL_MORPHINE_MG_PER_10_MG_IV_MORPHINE);
}
