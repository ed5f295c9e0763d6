import { describe, expect, it } from 'vitest';
import { PUMP_SETTING_FIELDS, PUMP_SETTING_LABELS, type PumpSettings } from './bedside.schema.js';
import { compareSettings } from './compare-settings.js';

// An independent double-check compares each clinician's reading of the pump with the order, at
// start, syringe change and every programming change [memory: ISMP's PCA safety recommendations; exact title and year to be confirmed].
// Regimen: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory] — morphine 1 mg/mL, demand 1 mg, lockout 10 min.
const ordered: PumpSettings = {
  drugId: 1,
  concentrationPerMl: 1,
  syringeVolumeMl: 50,
  loadingDose: null,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
};

describe('compareSettings', () => {
  it('matches when both entries equal the order, decimals compared with a tolerance', () => {
    expect(compareSettings(ordered, { ...ordered, demandDose: 0.1 + 0.9 }, ordered)).toEqual([]);
  });

  it('names the field and whose entry differs', () => {
    expect(compareSettings({ ...ordered, lockoutMinutes: 6 }, ordered, ordered)).toEqual([
      { field: 'lockoutMinutes', first: 6, second: 10, ordered: 10, differs: 'first' },
    ]);
    expect(compareSettings(ordered, { ...ordered, demandDose: 10 }, ordered)[0]).toMatchObject({ field: 'demandDose', differs: 'second' });
  });

  it('catches both nurses agreeing on the same wrong value', () => {
    const both = { ...ordered, concentrationPerMl: 10 };
    expect(compareSettings(both, both, ordered)).toEqual([
      { field: 'concentrationPerMl', first: 10, second: 10, ordered: 1, differs: 'both' },
    ]);
  });

  it('treats a missing optional limit as different from a set one', () => {
    expect(compareSettings({ ...ordered, fourHourLimit: null }, ordered, ordered)[0]).toMatchObject({
      field: 'fourHourLimit',
      differs: 'first',
    });
  });

  it('compares every setting a pump holds: drug, concentration, syringe, then the regimen fields but the clinician bolus', () => {
    expect(PUMP_SETTING_FIELDS).toEqual([
      'drugId',
      'concentrationPerMl',
      'syringeVolumeMl',
      'loadingDose',
      'demandDose',
      'lockoutMinutes',
      'basalRatePerHour',
      'oneHourLimit',
      'fourHourLimit',
    ]);
    expect(PUMP_SETTING_LABELS.lockoutMinutes).toBe('Lockout');
  });
});
