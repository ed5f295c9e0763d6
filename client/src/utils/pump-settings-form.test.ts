import { describe, expect, it } from 'vitest';
import { emptyPumpSettingsForm, readPumpSettingsForm, type PumpSettingsFormValues } from './pump-settings-form';

// The demo order's pump (Harbour, bed H07): HYDROmorphone 0.2 mg/mL, demand 0.2 mg, lockout 10 min,
// basal 0.1 mg/h, 4-hour limit 6 mg, 50 mL syringe, no loading dose and no 1-hour limit.
const typed: PumpSettingsFormValues = {
  drugId: '2',
  concentrationPerMl: 0.2,
  syringeVolumeMl: 50,
  loadingDose: '',
  demandDose: 0.2,
  lockoutMinutes: 10,
  basalRatePerHour: 0.1,
  oneHourLimit: '',
  fourHourLimit: '6',
};

describe('readPumpSettingsForm', () => {
  it('turns an entry into the API settings, empty optional fields into null', () => {
    expect(readPumpSettingsForm(typed)).toEqual({
      settings: {
        drugId: 2,
        concentrationPerMl: 0.2,
        syringeVolumeMl: 50,
        loadingDose: null,
        demandDose: 0.2,
        lockoutMinutes: 10,
        basalRatePerHour: 0.1,
        oneHourLimit: null,
        fourHourLimit: 6,
      },
      errors: {},
    });
  });

  it('keeps a typed 0 (a demand-only pump has a basal rate of 0)', () => {
    const { settings } = readPumpSettingsForm({ ...typed, basalRatePerHour: 0, loadingDose: '0' });
    expect(settings?.basalRatePerHour).toBe(0);
    expect(settings?.loadingDose).toBe(0);
  });

  it('names every missing required field, and nothing is sent', () => {
    const result = readPumpSettingsForm(emptyPumpSettingsForm());
    expect(result.settings).toBeNull();
    expect(result.errors).toEqual({
      drugId: 'Choose the drug',
      concentrationPerMl: 'Enter the concentration',
      syringeVolumeMl: 'Enter the syringe volume',
      demandDose: 'Enter the demand dose',
      lockoutMinutes: 'Enter the lockout',
      basalRatePerHour: 'Enter the basal rate (0 for none)',
    });
  });

  it('refuses text that is not a plain decimal and a concentration of 0', () => {
    const result = readPumpSettingsForm({ ...typed, lockoutMinutes: '1e1', concentrationPerMl: 0, fourHourLimit: '6 mg' });
    expect(result.errors).toEqual({
      lockoutMinutes: 'Lockout must be a number',
      concentrationPerMl: 'Concentration must be more than 0',
      fourHourLimit: '4-hour limit must be a number',
    });
  });
});

describe('emptyPumpSettingsForm', () => {
  it('starts every entry empty, and each call is a new object', () => {
    const a = emptyPumpSettingsForm();
    expect(Object.values(a).every((value) => value === '' || value === null)).toBe(true);
    expect(emptyPumpSettingsForm()).not.toBe(a);
  });
});
