import { describe, expect, it } from 'vitest';
import { allergyFormErrors, allergyRequest, toleranceFormErrors, toleranceRequest, weightFormErrors } from './record-forms';

const drugNames = new Map([[1, 'morphine']]);

describe('allergy form', () => {
  it('sends a picked formulary drug under its generic name, and free text as typed', () => {
    expect(allergyRequest({ drug: '1', substance: '', reaction: 'itch', severity: 'intolerance' }, drugNames)).toEqual({
      drugId: 1,
      substance: 'morphine',
      reaction: 'itch',
      severity: 'intolerance',
    });
    expect(allergyRequest({ drug: 'other', substance: 'Latex', reaction: 'hives', severity: 'allergy' }, drugNames).drugId).toBeNull();
  });

  it('names each missing field in the server’s words', () => {
    expect(allergyFormErrors({ drug: 'other', substance: ' ', reaction: '', severity: '' }, drugNames)).toEqual({
      substance: 'Enter the substance',
      reaction: 'Enter the reaction (or "not known")',
      severity: 'Choose the severity',
    });
  });
});

// US FDA definition of opioid tolerance (opioid analgesic labelling): at least 60 mg oral morphine a day for a week or longer.
describe('tolerance form', () => {
  it('claims tolerance exactly when the basis meets the definition', () => {
    expect(toleranceRequest({ oralMorphineMgPerDay: 60, days: 7 })).toEqual({ opioidTolerant: true, oralMorphineMgPerDay: 60, days: 7 });
    expect(toleranceRequest({ oralMorphineMgPerDay: 40, days: 30 }).opioidTolerant).toBe(false);
    expect(toleranceRequest({ oralMorphineMgPerDay: '', days: '' })).toEqual({
      opioidTolerant: false,
      oralMorphineMgPerDay: null,
      days: null,
    });
  });

  it('refuses a half-recorded basis and text that is not a number, beside the field', () => {
    expect(toleranceFormErrors({ oralMorphineMgPerDay: 90, days: '' })).toEqual({
      days: 'Enter for how many days this dose has been taken',
    });
    expect(toleranceFormErrors({ oralMorphineMgPerDay: '1e3', days: 10 }).oralMorphineMgPerDay).toBeDefined();
    expect(toleranceFormErrors({ oralMorphineMgPerDay: 90, days: 2.5 })).toEqual({ days: 'Days must be a whole number' });
  });
});

describe('weight form', () => {
  it('refuses a blank, zero or huge weight and a day in the future or before birth', () => {
    expect(weightFormErrors({ weightKg: '', measuredOn: '2026-12-03' }, '1960-01-01', '2026-12-03')).toEqual({
      weightKg: 'Enter the weight in kg',
    });
    expect(weightFormErrors({ weightKg: 0, measuredOn: '2026-12-03' }, '1960-01-01', '2026-12-03').weightKg).toBe(
      'Weight must be more than 0 kg',
    );
    expect(weightFormErrors({ weightKg: 501, measuredOn: '2026-12-03' }, '1960-01-01', '2026-12-03').weightKg).toBe(
      'Weight is at most 500 kg',
    );
    expect(weightFormErrors({ weightKg: 70, measuredOn: '2026-12-04' }, '1960-01-01', '2026-12-03')).toEqual({
      measuredOn: 'The weight cannot have been measured in the future',
    });
    expect(weightFormErrors({ weightKg: 70, measuredOn: '1959-12-31' }, '1960-01-01', '2026-12-03').measuredOn).toMatch(
      /before the date of birth/,
    );
    expect(weightFormErrors({ weightKg: 70.5, measuredOn: '2026-12-03' }, '1960-01-01', '2026-12-03')).toEqual({});
  });
});
