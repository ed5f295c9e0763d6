import { describe, expect, it } from 'vitest';
import type { Patient } from '@lockstep/shared';
import { formatWeight, matchesPatientSearch } from './patient-format';

const patient: Patient = {
  id: 1,
  mrn: 'KB100234',
  givenName: 'Grace',
  familyName: 'Okafor',
  dateOfBirth: '1961-04-09',
  sex: 'female',
  weightKg: 72,
  allergies: 'Penicillin (rash)',
  opioidTolerant: false,
  sleepApnoea: true,
  otherSedatives: false,
  wardId: 1,
  wardName: 'Harbour',
  bed: '4',
};

describe('patient formatting', () => {
  it('writes weight in kg as recorded', () => {
    expect(formatWeight(72)).toBe('72 kg');
    expect(formatWeight(18.65)).toBe('18.65 kg');
    expect(formatWeight(null)).toBe('Not recorded');
  });
});

describe('matchesPatientSearch', () => {
  it('matches names in either order and the MRN, ignoring case', () => {
    expect(matchesPatientSearch(patient, 'grace oka')).toBe(true);
    expect(matchesPatientSearch(patient, 'OKAFOR, g')).toBe(true);
    expect(matchesPatientSearch(patient, 'kb1002')).toBe(true);
    expect(matchesPatientSearch(patient, '  ')).toBe(true);
    expect(matchesPatientSearch(patient, 'mendes')).toBe(false);
  });
});
