import { describe, expect, it } from 'vitest';
import {
  meetsOpioidTolerance,
  OPIOID_TOLERANCE_MIN_DAYS,
  OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY,
  toleranceClaimProblem,
} from './opioid-tolerance.js';

// Source: US Food and Drug Administration, definition of opioid tolerance in opioid analgesic
// labelling (extended-release and long-acting opioid class labelling, 2014; year from memory):
// at least 60 mg oral morphine a day, or an equianalgesic dose, for one week or longer.
describe('opioid tolerance (FDA definition)', () => {
  it('uses the definition’s 60 mg oral morphine a day for 7 days', () => {
    expect(OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY).toBe(60);
    expect(OPIOID_TOLERANCE_MIN_DAYS).toBe(7);
  });

  it('is met at and above both thresholds only', () => {
    expect(meetsOpioidTolerance({ oralMorphineMgPerDay: 60, days: 7 })).toBe(true);
    expect(meetsOpioidTolerance({ oralMorphineMgPerDay: 240, days: 365 })).toBe(true);
    expect(meetsOpioidTolerance({ oralMorphineMgPerDay: 59.9, days: 30 })).toBe(false);
    expect(meetsOpioidTolerance({ oralMorphineMgPerDay: 90, days: 6 })).toBe(false);
  });

  it('is never met by a missing, NaN or infinite basis', () => {
    for (const basis of [
      { oralMorphineMgPerDay: null, days: null },
      { oralMorphineMgPerDay: 90, days: null },
      { oralMorphineMgPerDay: null, days: 30 },
      { oralMorphineMgPerDay: Number.NaN, days: 30 },
      { oralMorphineMgPerDay: Number.POSITIVE_INFINITY, days: 30 },
      { oralMorphineMgPerDay: 90, days: Number.POSITIVE_INFINITY },
    ])
      expect(meetsOpioidTolerance(basis), JSON.stringify(basis)).toBe(false);
  });
});

describe('toleranceClaimProblem', () => {
  it('accepts a tolerant claim with a basis that meets the definition, and a naive patient with none or a lower one', () => {
    expect(toleranceClaimProblem(true, { oralMorphineMgPerDay: 90, days: 14 })).toBeNull();
    expect(toleranceClaimProblem(false, { oralMorphineMgPerDay: null, days: null })).toBeNull();
    expect(toleranceClaimProblem(false, { oralMorphineMgPerDay: 30, days: 14 })).toBeNull();
  });

  it('refuses a tolerant claim without a basis that meets it, naming the field to correct', () => {
    expect(toleranceClaimProblem(true, { oralMorphineMgPerDay: null, days: null })?.field).toBe('oralMorphineMgPerDay');
    expect(toleranceClaimProblem(true, { oralMorphineMgPerDay: 40, days: 30 })?.field).toBe('oralMorphineMgPerDay');
    expect(toleranceClaimProblem(true, { oralMorphineMgPerDay: 90, days: 3 })?.field).toBe('days');
  });

  it('refuses a half-recorded basis and a naive claim whose basis meets the definition', () => {
    expect(toleranceClaimProblem(false, { oralMorphineMgPerDay: 90, days: null })?.field).toBe('days');
    expect(toleranceClaimProblem(false, { oralMorphineMgPerDay: null, days: 10 })?.field).toBe('oralMorphineMgPerDay');
    expect(toleranceClaimProblem(false, { oralMorphineMgPerDay: 90, days: 10 })?.field).toBe('opioidTolerant');
  });
});
