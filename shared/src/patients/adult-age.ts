/**
 * A patient is a child for dosing until their 18th birthday: common practice (the age of majority
 * in most countries and where paediatric services usually end), not a single published dosing rule.
 * The dose-limit library's paediatric rules and the weight checks for children use this one boundary.
 */
export const ADULT_AGE_YEARS = 18;

/** True for a patient under 18; false for 18 and over; null when the age is not known. */
export function isChild(ageYears: number | null | undefined): boolean | null {
  if (typeof ageYears !== 'number' || !Number.isFinite(ageYears)) return null;
  return ageYears < ADULT_AGE_YEARS;
}
