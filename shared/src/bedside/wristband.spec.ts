import { describe, expect, it } from 'vitest';
import { DOB_MISMATCH, MRN_MISMATCH, wristbandErrors } from './wristband.js';

// Invented patient. Two identifiers at the bedside is common practice [practice].
const patient = { mrn: 'KB100231', dateOfBirth: '1968-03-14' };

describe('wristbandErrors', () => {
  it('accepts the same MRN whatever its case and spaces, and the same date of birth', () => {
    expect(wristbandErrors({ patientMrn: ' kb100231 ', patientDateOfBirth: '1968-03-14' }, patient)).toEqual([]);
  });

  it('names each identifier that does not match, or is missing', () => {
    expect(wristbandErrors({ patientMrn: 'KB100232', patientDateOfBirth: '1968-04-13' }, patient)).toEqual([
      { field: 'patientMrn', message: MRN_MISMATCH },
      { field: 'patientDateOfBirth', message: DOB_MISMATCH },
    ]);
    expect(wristbandErrors({ patientMrn: ' ', patientDateOfBirth: '14/03/1968' }, patient).map((e) => e.message)).toEqual([
      'Enter the MRN from the wristband',
      'Enter the date of birth from the wristband',
    ]);
  });
});
