import { describe, expect, it } from 'vitest';
import {
  allergiesSummary,
  allergyStatus,
  opioidToleranceText,
  patientDisplayName,
  patientRiskFactors,
  sortAllergies,
} from './patient-display.js';

const itch = { substance: 'Morphine', reaction: 'itch', severity: 'intolerance' as const };
const rash = { substance: 'Penicillin', reaction: 'rash', severity: 'allergy' as const };
const shock = { substance: 'Latex', reaction: 'collapse', severity: 'anaphylaxis' as const };
const naive = {
  opioidTolerant: false,
  toleranceOralMorphineMgPerDay: null,
  toleranceDays: null,
  sleepApnoea: false,
  otherSedatives: false,
};

describe('patient display', () => {
  it('writes the family name in capitals first', () => {
    expect(patientDisplayName({ familyName: 'Okonkwo-Brandt', givenName: 'Felix' })).toBe('OKONKWO-BRANDT, Felix');
  });

  it('says "no known allergies" only when a clinician recorded it, and "not recorded" for an empty record', () => {
    expect(allergyStatus({ allergies: [], noKnownAllergies: true })).toBe('no-known-allergies');
    expect(allergyStatus({ allergies: [], noKnownAllergies: false })).toBe('not-recorded');
    expect(allergyStatus({ allergies: [itch], noKnownAllergies: false })).toBe('recorded');
    expect(allergiesSummary({ allergies: [], noKnownAllergies: true })).toBe('No known allergies');
    expect(allergiesSummary({ allergies: [], noKnownAllergies: false })).toBe('Allergies not recorded');
  });

  it('lists entries most severe first, with the severity as a word', () => {
    expect(sortAllergies([itch, rash, shock]).map((a) => a.substance)).toEqual(['Latex', 'Penicillin', 'Morphine']);
    expect(allergiesSummary({ allergies: [itch, shock], noKnownAllergies: false })).toBe(
      'Latex: collapse (Anaphylaxis); Morphine: itch (Intolerance)',
    );
  });

  it('lists the risk factors recorded, in screen order', () => {
    expect(patientRiskFactors({ ...naive, allergies: [], noKnownAllergies: true })).toEqual([]);
    expect(patientRiskFactors({ ...naive, allergies: [], noKnownAllergies: false })).toEqual(['allergies-not-recorded']);
    expect(
      patientRiskFactors({
        allergies: [rash, shock],
        noKnownAllergies: false,
        opioidTolerant: true,
        toleranceOralMorphineMgPerDay: 90,
        toleranceDays: 30,
        sleepApnoea: true,
        otherSedatives: true,
      }),
    ).toEqual(['anaphylaxis', 'allergies', 'opioid-tolerant', 'sleep-apnoea', 'other-sedatives']);
  });

  // US FDA definition of opioid tolerance in opioid analgesic labelling: at least 60 mg oral
  // morphine a day (or equianalgesic) for one week or longer.
  it('counts a tolerance only with a basis that meets the FDA definition, and says so', () => {
    const claimedBare = { ...naive, opioidTolerant: true, allergies: [], noKnownAllergies: true };
    expect(patientRiskFactors(claimedBare)).toEqual([]);
    expect(opioidToleranceText(claimedBare)).toContain('checked as opioid-naive');
    expect(opioidToleranceText({ opioidTolerant: true, toleranceOralMorphineMgPerDay: 90, toleranceDays: 30 })).toBe(
      'Opioid tolerant: 90 mg oral morphine a day for 30 days',
    );
    expect(opioidToleranceText({ opioidTolerant: false, toleranceOralMorphineMgPerDay: 30, toleranceDays: 3 })).toBe(
      'Opioid-naive (30 mg oral morphine a day for 3 days)',
    );
    expect(opioidToleranceText(naive)).toBe('Opioid-naive');
  });
});
