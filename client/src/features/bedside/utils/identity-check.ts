import { normaliseReleaseCode, type Patient, type SyringeReleaseResponse } from '@lockstep/shared';

export type IdentityValues = { patientMrn: string; patientDateOfBirth: string };

export const MRN_MISMATCH = 'This MRN is not this order’s patient: check the wristband';
export const DOB_MISMATCH = 'This date of birth is not this order’s patient: check the wristband';

/**
 * The wristband against the order's patient, before anything else is entered. The server checks
 * again when the first check is sent; this only saves a nurse entering the pump for nothing.
 */
export function identityErrors(
  values: IdentityValues,
  patient: Pick<Patient, 'mrn' | 'dateOfBirth'>,
): Partial<Record<keyof IdentityValues, string>> {
  const errors: Partial<Record<keyof IdentityValues, string>> = {};
  const mrn = values.patientMrn.trim();
  if (!mrn) errors.patientMrn = 'Enter the MRN from the wristband';
  else if (mrn.toUpperCase() !== patient.mrn.toUpperCase()) errors.patientMrn = MRN_MISMATCH;
  if (!/^\d{4}-\d{2}-\d{2}$/.test(values.patientDateOfBirth)) errors.patientDateOfBirth = 'Enter the date of birth from the wristband';
  else if (values.patientDateOfBirth !== patient.dateOfBirth) errors.patientDateOfBirth = DOB_MISMATCH;
  return errors;
}

/**
 * A typed or scanned release code against this order's syringes: the normalised code, or why it
 * cannot be used. A code the order does not know may be another order's: the server names that.
 */
export function releaseCodeProblem(
  typed: string,
  releases: readonly Pick<SyringeReleaseResponse, 'releaseCode' | 'status'>[],
): string | null {
  const code = normaliseReleaseCode(typed);
  if (!code) return 'Enter the release code from the syringe label';
  const release = releases.find((candidate) => candidate.releaseCode === code);
  if (!release) return 'No ready syringe for this order has this code. Check the label: never use a syringe released for another patient';
  if (release.status === 'in_use') return 'This syringe is already in use: use a new, ready syringe';
  if (release.status === 'finished') return 'This syringe is finished: use a new, ready syringe';
  return null;
}
