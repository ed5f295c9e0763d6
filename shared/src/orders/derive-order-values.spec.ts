import { describe, expect, it } from 'vitest';
import { deriveOrderValues } from './derive-order-values.js';

describe('deriveOrderValues', () => {
  it('works the common adult morphine starting regimen', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: morphine 1 mg demand, lockout 10 minutes,
    // standard concentration 1 mg/mL; 4-hour limit 30 mg (common practice, docs/clinical-sources.md).
    const derived = deriveOrderValues({
      doseUnit: 'mg',
      concentrationPerMl: 1,
      demandDose: 1,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      fourHourLimit: 30,
    });
    expect(derived).toEqual({
      demandDoseMl: 1,
      basalRateMlPerHour: 0,
      maxDemandsPerHour: 6, // ceil(60 / 10), by definition (docs/design.md, "Order fields and dosing conventions")
      maxHourlyDose: 6,
      maxFourHourDose: 24, // 1 mg × ceil(240 / 10), under the 30 mg limit
    });
  });

  it('works the common hydromorphone regimen with the volume per demand', () => {
    // A common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]: hydromorphone 0.2 mg demand at the standard 0.2 mg/mL.
    const derived = deriveOrderValues({
      doseUnit: 'mg',
      concentrationPerMl: 0.2,
      demandDose: 0.2,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      fourHourLimit: 6,
    });
    expect(derived.demandDoseMl).toBe(1);
    expect(derived.maxFourHourDose).toBeCloseTo(4.8, 10);
  });

  it('counts the loading dose and a clinician bolus in the maxima, the same figures the check uses', () => {
    // Written wrong before: loading dose and clinician bolus were left out. Definition (docs/design.md).
    const derived = deriveOrderValues({
      doseUnit: 'mg',
      concentrationPerMl: 1,
      loadingDose: 2,
      demandDose: 1,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      clinicianBolusDose: 2,
    });
    expect(derived.maxHourlyDose).toBe(10); // 2 + 6 × 1 + 2
    expect(derived.maxFourHourDose).toBe(28); // 2 + 24 × 1 + 2
  });
});
