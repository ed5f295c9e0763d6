/**
 * Opioid tolerance as the US Food and Drug Administration defines it in opioid analgesic labelling
 * (class labelling for extended-release and long-acting opioid analgesics, 2014; year from memory):
 * a patient taking, for one week or longer, at least 60 mg of oral morphine a day, or an
 * equianalgesic dose of another opioid.
 */
export const OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY = 60;
/** "For one week or longer": the same FDA definition. */
export const OPIOID_TOLERANCE_MIN_DAYS = 7;

/** An input sanity bound, not a clinical threshold (common practice): more than this is a typing error. */
export const TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY = 20_000;
/** An input sanity bound (common practice): about a hundred years. */
export const TOLERANCE_MAX_DAYS = 36_500;

/** What a tolerance claim rests on: oral morphine (or equianalgesic) mg a day, taken for how many days. */
export type ToleranceBasis = { oralMorphineMgPerDay: number | null; days: number | null };

/** True when the basis meets the FDA definition: at least 60 mg oral morphine a day for at least 7 days. Anything not a finite number does not. */
export function meetsOpioidTolerance(basis: ToleranceBasis): boolean {
  const { oralMorphineMgPerDay: mg, days } = basis;
  return (
    typeof mg === 'number' &&
    typeof days === 'number' &&
    Number.isFinite(mg) &&
    Number.isFinite(days) &&
    mg >= OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY &&
    days >= OPIOID_TOLERANCE_MIN_DAYS
  );
}

/**
 * Why a recorded claim and its basis disagree, naming the field to correct, or null when they agree:
 * a tolerant claim needs a basis that meets the definition, and a basis that meets it is a tolerant
 * patient. A half-recorded basis (a dose without days, or days without a dose) is refused either way.
 */
export function toleranceClaimProblem(
  opioidTolerant: boolean,
  basis: ToleranceBasis,
): { field: 'opioidTolerant' | 'oralMorphineMgPerDay' | 'days'; message: string } | null {
  const { oralMorphineMgPerDay: mg, days } = basis;
  if (mg !== null && days === null) return { field: 'days', message: 'Enter for how many days this dose has been taken' };
  if (mg === null && days !== null) return { field: 'oralMorphineMgPerDay', message: 'Enter the oral morphine mg a day' };
  if (opioidTolerant) {
    if (mg === null || mg < OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY)
      return {
        field: 'oralMorphineMgPerDay',
        message: `Opioid tolerance needs at least ${OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY} mg oral morphine a day (or equianalgesic)`,
      };
    if (days === null || days < OPIOID_TOLERANCE_MIN_DAYS)
      return { field: 'days', message: `Opioid tolerance needs the dose taken for at least ${OPIOID_TOLERANCE_MIN_DAYS} days` };
    return null;
  }
  return meetsOpioidTolerance(basis)
    ? { field: 'opioidTolerant', message: 'This basis meets the definition of opioid tolerance: record the patient as tolerant' }
    : null;
}
