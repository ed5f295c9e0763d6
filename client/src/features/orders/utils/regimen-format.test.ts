import { describe, expect, it } from 'vitest';
import { drugWithConcentration, fieldValueText, limitRangeText, regimenSummary } from './regimen-format';

describe('regimen in safe format', () => {
  it('writes a regimen on one line with tall-man names and no trailing zeros', () => {
    // Tall-man letters: FDA and ISMP look-alike drug names list (ISMP 2023), as in shared's tallMan.
    expect(
      regimenSummary({
        drugName: 'hydromorphone',
        concentrationPerMl: 0.2,
        doseUnit: 'mg',
        demandDose: 0.2,
        lockoutMinutes: 10,
        basalRatePerHour: 0.1,
        oneHourLimit: null,
        fourHourLimit: 6,
      }),
    ).toBe('HYDROmorphone 0.2 mg/mL · demand 0.2 mg · lockout 10 min · basal 0.1 mg/h · 4-hour limit 6 mg');
    expect(
      regimenSummary({
        drugName: 'fentanyl',
        concentrationPerMl: 10,
        doseUnit: 'mcg',
        demandDose: 10,
        lockoutMinutes: 10,
        basalRatePerHour: 0,
        oneHourLimit: 60,
        fourHourLimit: null,
      }),
    ).toBe('fentaNYL 10 mcg/mL · demand 10 mcg · lockout 10 min · 1-hour limit 60 mcg');
    expect(drugWithConcentration('morphine', 1, 'mg')).toBe('morphine 1 mg/mL');
  });

  it('shows each field with its own unit', () => {
    expect(fieldValueText('basalRatePerHour', 0.5, 'mg')).toBe('0.5 mg/h');
    expect(fieldValueText('lockoutMinutes', 10, 'mg')).toBe('10 min');
    expect(fieldValueText('loadingDose', null, 'mg')).toBe('Not set');
  });

  it('states the limits beside an input, and works a per-kg range out for the patient', () => {
    expect(limitRangeText('demandDose', { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 }, 'mg', false, 82)).toBe(
      'Soft 0.5–2 mg · hard 0.2–3 mg',
    );
    expect(limitRangeText('fourHourLimit', { softMax: 30, hardMax: 40 }, 'mg', false, null)).toBe('Soft up to 30 mg · hard up to 40 mg');
    expect(limitRangeText('demandDose', { softMin: 0.01, softMax: 0.02, hardMax: 0.03 }, 'mg', true, 24.5)).toBe(
      'Soft 0.01–0.02 mg/kg · hard up to 0.03 mg/kg (soft 0.245–0.49 mg for 24.5 kg)',
    );
    expect(limitRangeText('lockoutMinutes', { softMin: 5, softMax: 10 }, 'mg', true, 24.5)).toBe('Soft 5–10 min');
    expect(limitRangeText('loadingDose', undefined, 'mg', false, null)).toBeNull();
  });
});
