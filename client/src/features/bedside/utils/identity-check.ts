import { normaliseReleaseCode, wristbandErrors, type Patient, type SyringeReleaseResponse, type WristbandEntry } from '@lockstep/shared';

export type IdentityValues = WristbandEntry;

/**
 * The wristband against the order's patient, before anything else is entered, by the shared rule
 * the server checks again when the first check is sent: this only saves entering the pump for nothing.
 */
export function identityErrors(
  values: IdentityValues,
  patient: Pick<Patient, 'mrn' | 'dateOfBirth'>,
): Partial<Record<keyof IdentityValues, string>> {
  return Object.fromEntries(wristbandErrors(values, patient).map((error) => [error.field, error.message]));
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
