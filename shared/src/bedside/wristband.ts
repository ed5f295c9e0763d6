import type { FieldError } from '../api/api-error.schema.js';

/** What the nurse reads off the wristband. */
export type WristbandEntry = { patientMrn: string; patientDateOfBirth: string };

export const MRN_MISMATCH = 'This MRN is not this order’s patient: check the wristband';
export const DOB_MISMATCH = 'This date of birth is not this order’s patient: check the wristband';

/**
 * The wristband against the order's patient (two identifiers: MRN and date of birth). The MRN is
 * compared without case or surrounding spaces, as typed or scanned; the date exactly.
 */
export function wristbandErrors(entry: WristbandEntry, patient: { mrn: string; dateOfBirth: string }): FieldError[] {
  const errors: FieldError[] = [];
  const mrn = entry.patientMrn.trim();
  if (!mrn) errors.push({ field: 'patientMrn', message: 'Enter the MRN from the wristband' });
  else if (mrn.toUpperCase() !== patient.mrn.toUpperCase()) errors.push({ field: 'patientMrn', message: MRN_MISMATCH });
  if (!/^\d{4}-\d{2}-\d{2}$/.test(entry.patientDateOfBirth)) {
    errors.push({ field: 'patientDateOfBirth', message: 'Enter the date of birth from the wristband' });
  } else if (entry.patientDateOfBirth !== patient.dateOfBirth) {
    errors.push({ field: 'patientDateOfBirth', message: DOB_MISMATCH });
  }
  return errors;
}
