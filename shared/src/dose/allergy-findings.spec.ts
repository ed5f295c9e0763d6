import { describe, expect, it } from 'vitest';
import { allergyFindings } from './allergy-findings.js';
import type { PatientAllergy } from './types.js';

const MORPHINE = { id: 1, genericName: 'morphine' };
const HYDROMORPHONE = { id: 2, genericName: 'hydromorphone' };
const entry = (overrides: Partial<PatientAllergy>): PatientAllergy => ({
  drugId: null,
  substance: 'Morphine',
  reaction: 'itch',
  severity: 'allergy',
  ...overrides,
});

/** Whether one entry is about the drug, through the findings it gives. */
const allergyNamesDrug = (allergy: PatientAllergy, drug: { id: number; genericName: string }) =>
  allergyFindings(drug, [allergy]).length > 0;

describe('which entries name the ordered drug', () => {
  it('matches the same formulary drug whatever the text says', () => {
    expect(allergyNamesDrug(entry({ drugId: 1, substance: 'MST' }), MORPHINE)).toBe(true);
  });

  it('matches free text naming the generic name as a whole word, in any case', () => {
    for (const substance of ['morphine', 'MORPHINE', 'Morphine sulfate', 'codeine, morphine', 'morphine-containing products']) {
      expect(allergyNamesDrug(entry({ substance }), MORPHINE), substance).toBe(true);
    }
  });

  it('does not match another drug whose name contains the generic name', () => {
    expect(allergyNamesDrug(entry({ substance: 'Hydromorphone' }), MORPHINE)).toBe(false);
    expect(allergyNamesDrug(entry({ substance: 'Morphine' }), HYDROMORPHONE)).toBe(false);
    expect(allergyNamesDrug(entry({ drugId: 2, substance: 'Hydromorphone' }), MORPHINE)).toBe(false);
  });

  it('does not match unrelated substances', () => {
    expect(allergyNamesDrug(entry({ substance: 'Penicillin' }), MORPHINE)).toBe(false);
    expect(allergyNamesDrug(entry({ substance: 'Latex' }), { id: 9, genericName: '' })).toBe(false);
  });
});

describe('allergyFindings', () => {
  it('blocks a drug the patient is recorded as anaphylactic to, naming substance, reaction and severity', () => {
    const findings = allergyFindings(MORPHINE, [entry({ drugId: 1, reaction: 'throat swelling', severity: 'anaphylaxis' })]);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ field: 'drugId', severity: 'hard', code: 'allergy.anaphylaxis' });
    expect(findings[0].message).toContain('Morphine');
    expect(findings[0].message).toContain('throat swelling');
    expect(findings[0].message).toContain('anaphylaxis');
  });

  it('asks for a reason for an allergy or an intolerance', () => {
    const allergy = allergyFindings(MORPHINE, [entry({ reaction: 'hives' })]);
    expect(allergy).toEqual([expect.objectContaining({ field: 'drugId', severity: 'soft', code: 'allergy.allergy' })]);
    expect(allergy[0].message).toContain('hives');
    const intolerance = allergyFindings(MORPHINE, [entry({ reaction: 'vomiting', severity: 'intolerance' })]);
    expect(intolerance).toEqual([expect.objectContaining({ field: 'drugId', severity: 'soft', code: 'allergy.intolerance' })]);
    expect(intolerance[0].message).toContain('intolerance');
  });

  it('gives one finding per matching entry and none for the others', () => {
    const findings = allergyFindings(MORPHINE, [
      entry({ substance: 'Penicillin', severity: 'anaphylaxis' }),
      entry({ substance: 'morphine', severity: 'intolerance' }),
      entry({ drugId: 1, substance: 'Morphine', severity: 'anaphylaxis' }),
    ]);
    expect(findings.map((f) => f.severity)).toEqual(['soft', 'hard']);
  });

  it('finds nothing without a drug, without entries, or for an empty list', () => {
    expect(allergyFindings(undefined, [entry({ severity: 'anaphylaxis' })])).toEqual([]);
    expect(allergyFindings(MORPHINE, undefined)).toEqual([]);
    expect(allergyFindings(MORPHINE, [])).toEqual([]);
  });
});
