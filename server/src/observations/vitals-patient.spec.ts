import { describe, expect, it } from 'vitest';
import { vitalsPatient } from './vitals-patient.js';

describe('vitalsPatient', () => {
  it("takes the paediatric bands from the ward's population, not from its weight-based dosing", () => {
    const at = new Date('2026-12-03T12:00:00Z');
    expect(vitalsPatient({ dateOfBirth: '2018-08-17', wardPopulation: 'paediatric', spo2Scale: '1' }, at)).toEqual({
      ageYears: 8,
      paediatricWard: true,
      spo2Scale: '1',
    });
    expect(vitalsPatient({ dateOfBirth: '1968-03-14', wardPopulation: 'adult', spo2Scale: '2' }, at)).toEqual({
      ageYears: 58,
      paediatricWard: false,
      spo2Scale: '2',
    });
  });

  it('counts the age at the reading, and treats an unknown date of birth or scale as unknown age and scale 1', () => {
    const facts = { dateOfBirth: '2010-12-04', wardPopulation: 'adult' as const, spo2Scale: null };
    expect(vitalsPatient(facts, new Date('2026-12-03T12:00:00Z')).ageYears).toBe(15);
    expect(vitalsPatient(facts, new Date('2026-12-04T12:00:00Z')).ageYears).toBe(16);
    expect(vitalsPatient({ dateOfBirth: null, wardPopulation: 'adult', spo2Scale: null }, new Date())).toEqual({
      ageYears: null,
      paediatricWard: false,
      spo2Scale: '1',
    });
  });
});
