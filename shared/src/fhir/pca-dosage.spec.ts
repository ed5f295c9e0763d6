import { describe, expect, it } from 'vitest';
import { type PcaRegimenSource, pcaDosageInstructions } from './pca-dosage.js';

// Hydromorphone 0.2 mg demand, lockout 10 minutes: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]; 4-hour limit 6 mg: a widely used clinical reference table [practice].
const REGIMEN: PcaRegimenSource = {
  doseUnit: 'mg',
  loadingDose: null,
  demandDose: 0.2,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 6,
  clinicianBolusDose: null,
};

// Source: HL7 FHIR R4 (4.0.1), Dosage: sequence, asNeeded[x], timing, maxDosePerPeriod (0..1).
describe('pcaDosageInstructions', () => {
  it('starts the PCA at sequence 1 when there is no loading dose, and a zero dose is no dose', () => {
    const dosages = pcaDosageInstructions({ ...REGIMEN, loadingDose: 0, clinicianBolusDose: 0 });
    expect(dosages.map((dosage) => dosage.sequence)).toEqual([1, 1]);
    expect(dosages.map((dosage) => dosage.text)).toEqual([
      'Demand dose 0.2 mg intravenously when the patient presses the button; lockout 10 min',
      '4-hour limit: at most 6 mg in any 4 hours, demand doses and basal rate together',
    ]);
  });

  it('puts one limit in each maxDosePerPeriod', () => {
    const dosages = pcaDosageInstructions({ ...REGIMEN, oneHourLimit: 2 });
    const limits = dosages.filter((dosage) => dosage.maxDosePerPeriod);
    expect(limits.map((dosage) => [dosage.maxDosePerPeriod?.numerator.value, dosage.maxDosePerPeriod?.denominator.value])).toEqual([
      [2, 1],
      [6, 4],
    ]);
    expect(limits.every((dosage) => !dosage.doseAndRate && !dosage.asNeededBoolean)).toBe(true);
  });

  it('keeps a lockout of part minutes exact in both the timing and the extension', () => {
    const [demand] = pcaDosageInstructions({ ...REGIMEN, lockoutMinutes: 7.5 });
    expect(demand.timing).toEqual({ repeat: { frequency: 1, period: 7.5, periodUnit: 'min' } });
    expect(demand.extension?.[0].valueDuration).toMatchObject({ value: 7.5, code: 'min' });
  });
});
