import { describe, expect, it } from 'vitest';
import { DOB_MISMATCH, MRN_MISMATCH } from '@lockstep/shared';
import { identityErrors, releaseCodeProblem } from './identity-check';

const patient = { mrn: 'KB100672', dateOfBirth: '1979-07-28' };

describe('identityErrors', () => {
  it('accepts the wristband in any case, with spaces around', () => {
    expect(identityErrors({ patientMrn: ' kb100672 ', patientDateOfBirth: '1979-07-28' }, patient)).toEqual({});
  });

  it('names each identifier that does not match, or is missing', () => {
    expect(identityErrors({ patientMrn: 'KB100673', patientDateOfBirth: '1979-08-28' }, patient)).toEqual({
      patientMrn: MRN_MISMATCH,
      patientDateOfBirth: DOB_MISMATCH,
    });
    expect(identityErrors({ patientMrn: '', patientDateOfBirth: '' }, patient)).toEqual({
      patientMrn: 'Enter the MRN from the wristband',
      patientDateOfBirth: 'Enter the date of birth from the wristband',
    });
  });
});

describe('releaseCodeProblem', () => {
  const releases = [
    { releaseCode: 'HK3-7QT', status: 'ready' as const },
    { releaseCode: 'M4P-2XD', status: 'finished' as const },
  ];

  it('accepts a scanned or typed code: lower case, no dash, spaces', () => {
    expect(releaseCodeProblem('hk3 7qt', releases)).toBeNull();
    expect(releaseCodeProblem('HK37QT', releases)).toBeNull();
    expect(releaseCodeProblem('hk3-7qt', releases)).toBeNull();
  });

  it('refuses an unknown, a finished or an empty code', () => {
    expect(releaseCodeProblem('ZZZ-ZZZ', releases)).toMatch(/never use a syringe released for another patient/);
    expect(releaseCodeProblem('m4p2xd', releases)).toMatch(/finished/);
    expect(releaseCodeProblem('  ', releases)).toBe('Enter the release code from the syringe label');
  });
});
