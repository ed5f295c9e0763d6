import { describe, expect, it } from 'vitest';
import type { Patient } from '@lockstep/shared';
import { formatWeight, formatWeightDate, localToday, matchesPatientSearch } from './patient-format';

const patient: Patient = {
  id: 1,
  mrn: 'KB100234',
  givenName: 'Grace',
  familyName: 'Okafor',
  dateOfBirth: '1961-04-09',
  sex: 'female',
  weightKg: 72,
  weightMeasuredOn: '2026-12-01',
  allergies: [
    { id: 1, drugId: null, substance: 'Penicillin', reaction: 'rash', severity: 'allergy', recordedByName: null, recordedAt: null },
  ],
  noKnownAllergies: false,
  opioidTolerant: false,
  toleranceOralMorphineMgPerDay: null,
  toleranceDays: null,
  spo2Scale: '1',
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

  it('says when the weight was measured, and when that is not recorded', () => {
    expect(formatWeightDate('2026-12-03', '2026-12-03')).toMatch(/^measured .*2026 \(today\)$/);
    expect(formatWeightDate('2026-11-28', '2026-12-03')).toMatch(/\(5 days ago\)$/);
    expect(formatWeightDate(null, '2026-12-03')).toBe('date measured not recorded');
    expect(localToday(new Date(2026, 11, 3, 23, 59))).toBe('2026-12-03');
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
