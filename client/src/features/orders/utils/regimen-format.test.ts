import { describe, expect, it } from 'vitest';
import { fieldValueText, limitRangeText } from './regimen-format';

describe('regimen in safe format', () => {
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

  it('shows a limit to its full stored precision, never rounded; a range worked out from it in the safe dose format', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations: the spelling; a limit
    // rounded to 3 decimals (0.0125 → 0.013) would misstate the library.
    expect(limitRangeText('demandDose', { softMin: 0.0125, softMax: 0.0175 }, 'mg', true, 20)).toBe(
      'Soft 0.0125–0.0175 mg/kg (soft 0.25–0.35 mg for 20 kg)',
    );
    expect(limitRangeText('demandDose', { softMax: 0.0125 }, 'mg', true, 3.3)).toBe(
      'Soft up to 0.0125 mg/kg (soft up to 41.25 mcg for 3.3 kg)',
    );
  });
});
