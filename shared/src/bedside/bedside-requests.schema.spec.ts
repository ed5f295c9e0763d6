import { describe, expect, it } from 'vitest';
import { requestFieldErrors } from '../api/request-errors.js';
import { bolusSchema, pumpSettingsSchema } from './bedside-requests.schema.js';

const settings = {
  drugId: 1,
  concentrationPerMl: 1,
  syringeVolumeMl: 50,
  loadingDose: null,
  demandDose: 1,
  lockoutMinutes: 5,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: 30,
};
const errorsOf = (result: ReturnType<typeof pumpSettingsSchema.safeParse>) => (result.success ? [] : requestFieldErrors(result.error));

describe('pumpSettingsSchema', () => {
  it('takes null for a setting the pump has none of, but not a setting left out', () => {
    expect(pumpSettingsSchema.safeParse(settings).success).toBe(true);
    const { loadingDose: _loadingDose, ...withoutLoadingDose } = settings;
    expect(errorsOf(pumpSettingsSchema.safeParse(withoutLoadingDose))).toEqual([
      { field: 'loadingDose', message: 'Enter the loading dose, or leave it empty (null) for none' },
    ]);
  });
});

describe('bolusSchema', () => {
  const bolus = { witness: { username: ' rosa.adeyemi ', password: 'pw' }, amount: 2, reason: '  Breakthrough pain on moving  ' };

  it('trims the witness and the reason, and takes no override reason or a null one', () => {
    expect(bolusSchema.parse(bolus)).toEqual({
      ...bolus,
      witness: { username: 'rosa.adeyemi', password: 'pw' },
      reason: 'Breakthrough pain on moving',
    });
    expect(bolusSchema.safeParse({ ...bolus, overrideReason: null }).success).toBe(true);
  });

  it('counts a reason once trimmed, and says what the server says', () => {
    const result = bolusSchema.safeParse({ ...bolus, reason: '   short    ', amount: 0 });
    expect(result.success ? [] : requestFieldErrors(result.error)).toEqual([
      { field: 'amount', message: 'The bolus must be more than 0' },
      { field: 'reason', message: 'Give a reason of at least 10 characters' },
    ]);
  });
});
