import {
  conversionFor,
  type Drug,
  formatDose,
  oralMorphineEquivalent,
  REFERENCE_PARENTERAL_MORPHINE_MG,
  referenceDrugId,
  tallMan,
  type EquianalgesicFactor,
} from '@lockstep/shared';

const REFERENCE = `${formatDose(REFERENCE_PARENTERAL_MORPHINE_MG, 'mg')} parenteral morphine`;

/** What a row says, in words: 'HYDROmorphone 2 mg parenteral ≈ 10 mg parenteral morphine'. */
export function describeFactor(factor: EquianalgesicFactor): string {
  const amount = formatDose(factor.amount, factor.unit);
  if (factor.route === 'oral') return `${tallMan(factor.genericName)} ${amount} oral ≈ ${REFERENCE}`;
  return `${tallMan(factor.genericName)} ${amount} parenteral ≈ ${REFERENCE}`;
}

/** Formulary drugs with no parenteral row: they show no oral-morphine figure until pharmacy sets one. */
export function drugsWithoutFactor(drugs: readonly Drug[], factors: readonly EquianalgesicFactor[]): Drug[] {
  return drugs.filter((drug) => !factors.some((factor) => factor.drugId === drug.id && factor.route === 'parenteral'));
}

/** Whether the row is the reference itself (parenteral morphine 10 mg), which no one changes. */
export function isReferenceRow(factor: EquianalgesicFactor, factors: readonly EquianalgesicFactor[]): boolean {
  return factor.route === 'parenteral' && factor.drugId === referenceDrugId(factors);
}

/**
 * What one unit of a drug given parenterally comes to as oral morphine with the table as it
 * stands ('1 mg ≈ 15 mg oral morphine'), computed by the same shared function as the usage page;
 * null for the oral row, or when the table has no oral row.
 */
export function oralMorphinePerUnit(factor: EquianalgesicFactor, factors: readonly EquianalgesicFactor[]): string | null {
  if (factor.route !== 'parenteral') return null;
  const found = conversionFor(factor.drugId, factors);
  if (!found) return null;
  const oral = oralMorphineEquivalent(1, factor.unit, found.conversion);
  return Number.isFinite(oral) ? `${formatDose(1, factor.unit)} ≈ ${formatDose(oral, 'mg')} oral morphine` : null;
}
