import { describe, expect, it } from 'vitest';
import { drugAndConcentration, formatRegimen, regimenParts, type RegimenDisplay } from './format-regimen.js';

// The safe dose format (ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations:
// leading zero, no trailing zero, mcg and mL) and tall-man lettering (FDA and ISMP Lists of
// Look-Alike Drug Names with Recommended Tall Man Letters, ISMP 2023) come from formatDose and
// tallMan; this checks the regimen is written one way. The regimen values are invented.
const hydromorphone: RegimenDisplay = {
  drugName: 'hydromorphone',
  concentrationPerMl: 0.2,
  doseUnit: 'mg',
  loadingDose: null,
  demandDose: 0.2,
  lockoutMinutes: 10,
  basalRatePerHour: 0.1,
  oneHourLimit: null,
  fourHourLimit: 6,
};

describe('formatRegimen', () => {
  it('writes the drug, then each set value in the safe format, on one line', () => {
    expect(formatRegimen(hydromorphone)).toBe(
      'HYDROmorphone 0.2 mg/mL · demand 0.2 mg · lockout 10 min · basal 0.1 mg/h · 4-hour limit 6 mg',
    );
    expect(formatRegimen({ ...hydromorphone, basalRatePerHour: 0 }, { withDrug: false })).toBe(
      'demand 0.2 mg · lockout 10 min · 4-hour limit 6 mg',
    );
    expect(
      formatRegimen({
        ...hydromorphone,
        drugName: 'fentanyl',
        doseUnit: 'mcg',
        concentrationPerMl: 10,
        loadingDose: 25,
        demandDose: 10,
        basalRatePerHour: 0,
        oneHourLimit: 100,
        fourHourLimit: 300,
      }),
    ).toBe('fentaNYL 10 mcg/mL · loading 25 mcg · demand 10 mcg · lockout 10 min · 1-hour limit 100 mcg · 4-hour limit 300 mcg');
  });

  it('labels each part for a table, with "None" for no basal rate', () => {
    expect(regimenParts({ ...hydromorphone, basalRatePerHour: 0 })).toEqual([
      { label: 'Demand dose', value: '0.2 mg' },
      { label: 'Lockout', value: '10 min' },
      { label: 'Basal rate', value: 'None' },
      { label: '4-hour limit', value: '6 mg' },
    ]);
    expect(regimenParts(hydromorphone, { showUnset: true }).slice(-2)).toEqual([
      { label: '1-hour limit', value: 'Not set' },
      { label: '4-hour limit', value: '6 mg' },
    ]);
    expect(drugAndConcentration(hydromorphone)).toBe('HYDROmorphone 0.2 mg/mL');
  });
});
