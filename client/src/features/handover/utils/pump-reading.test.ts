import { describe, expect, it } from 'vitest';
import { emptyPumpReading, readPumpReading, signoffFormErrors } from './pump-reading';

describe('readPumpReading', () => {
  it('asks for every required setting of an empty reading', () => {
    const { settings, errors } = readPumpReading(emptyPumpReading());
    expect(settings).toBeNull();
    expect(errors).toMatchObject({
      drugId: 'Choose the drug',
      demandDose: 'Enter the demand dose',
      basalRatePerHour: 'Enter the basal rate (0 for none)',
    });
    expect(errors.loadingDose).toBeUndefined();
  });

  it('reads a full reading, empty optional settings as none (null)', () => {
    const { settings } = readPumpReading({
      ...emptyPumpReading(),
      drugId: '2',
      concentrationPerMl: 0.2,
      syringeVolumeMl: '50',
      demandDose: '0.2',
      lockoutMinutes: 10,
      basalRatePerHour: '0',
      fourHourLimit: '6',
    });
    expect(settings).toEqual({
      drugId: 2,
      concentrationPerMl: 0.2,
      syringeVolumeMl: 50,
      loadingDose: null,
      demandDose: 0.2,
      lockoutMinutes: 10,
      basalRatePerHour: 0,
      oneHourLimit: null,
      fourHourLimit: 6,
    });
  });
});

describe('signoffFormErrors', () => {
  it('puts each differing setting and the password beside its field, the rest in the alert', () => {
    expect(
      signoffFormErrors([
        { field: 'settings.demandDose', message: 'Demand dose differs' },
        { field: 'signature.password', message: 'Wrong password' },
        { field: 'role', message: 'Two different people' },
      ]),
    ).toEqual({ fieldErrors: { demandDose: 'Demand dose differs', password: 'Wrong password' }, other: ['Two different people'] });
  });
});
