import { describe, expect, it } from 'vitest';
import type { ObservationResponse } from '@lockstep/shared';
import {
  emptyObservationForm,
  numberFieldError,
  pumpBounds,
  readLocalDateTime,
  toObservationRequest,
  validateObservationForm,
  type ObservationCheckContext,
  type ObservationFormValues,
} from './observation-form';

const NOW = new Date('2026-03-03T14:00:00.000Z');

function observation(
  id: number,
  at: string,
  releaseId: number,
  attempts: number,
  delivered: number,
  volumeInfusedMl: number,
): ObservationResponse {
  return {
    id,
    orderId: 1,
    releaseId,
    at,
    painScore: 3,
    sedationLevel: '1',
    respiratoryRate: 14,
    spo2: 96,
    attempts,
    delivered,
    volumeInfusedMl,
    syringeRemainingMl: 40,
    note: '',
    oxygenLitresPerMinute: null,
    oxygenDevice: null,
    heartRate: null,
    systolicBp: null,
    temperatureC: null,
    consciousness: null,
    news2: null,
    news2NotScored: null,
    recordedByName: 'Kai Mendes',
  };
}

const OBSERVATIONS = [
  observation(1, '2026-03-03T10:00:00.000Z', 7, 20, 15, 9), // the previous syringe
  observation(2, '2026-03-03T12:00:00.000Z', 8, 6, 4, 2),
  observation(3, '2026-03-03T13:00:00.000Z', 8, 9, 6, 3),
];

/** A moment as a `datetime-local` input shows it in this machine's time zone. */
const localInput = (date: Date) => new Date(date.getTime() - date.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);

const CONTEXT: ObservationCheckContext = {
  observations: OBSERVATIONS,
  release: { id: 8, volumeMl: 50 },
  startedAt: '2026-03-03T09:00:00.000Z',
  now: NOW,
};

const FILLED: ObservationFormValues = {
  ...emptyObservationForm(),
  painScore: 4,
  sedationLevel: '3',
  respiratoryRate: 12,
  spo2: 95,
  attempts: 9,
  delivered: 6,
  volumeInfusedMl: 3.5,
  syringeRemainingMl: 46.5,
  oxygenLitresPerMinute: 0,
};

describe('plausible ranges', () => {
  it('checks pain 0–10, respiratory rate 0–80 and SpO2 0–100, whole numbers, with the server’s words', () => {
    expect(numberFieldError('painScore', 11)).toBe('Pain score is 0 to 10');
    expect(numberFieldError('painScore', 2.5)).toBe('Pain score is a whole number from 0 to 10');
    expect(numberFieldError('painScore', 0)).toBeNull();
    expect(numberFieldError('respiratoryRate', 81)).toBe('Respiratory rate is 0 to 80 per minute');
    expect(numberFieldError('spo2', 101)).toBe('SpO2 is 0 to 100 %');
    expect(numberFieldError('spo2', '')).toBe('Enter the SpO2');
    expect(numberFieldError('attempts', -1)).toBe('Attempts cannot be negative');
    expect(numberFieldError('volumeInfusedMl', 2.25)).toBeNull();
  });

  it('accepts a complete observation', () => {
    expect(validateObservationForm(FILLED, CONTEXT)).toEqual({});
  });

  it('names every missing value, and the sedation level', () => {
    const errors = validateObservationForm(emptyObservationForm(), CONTEXT);
    expect(errors.sedationLevel).toBe('Choose the sedation level');
    expect(errors.painScore).toBe('Enter the pain score');
    // Oxygen too: SpO2 is always recorded, and the oxygen beside it (0 for air).
    expect(errors.oxygenLitresPerMinute).toBe('Record the oxygen: 0 for air, or litres per minute');
    expect(Object.keys(errors)).toHaveLength(9);
  });
});

describe('pump totals', () => {
  it('finds the observations of the running syringe just before and after a time', () => {
    expect(pumpBounds(OBSERVATIONS, 8, NOW).floor).toMatchObject({ attempts: 9, delivered: 6, volumeInfusedMl: 3 });
    expect(pumpBounds(OBSERVATIONS, 8, NOW).ceiling).toBeNull();
    expect(pumpBounds(OBSERVATIONS, 8, new Date('2026-03-03T12:30:00.000Z'))).toMatchObject({
      floor: { attempts: 6 },
      ceiling: { attempts: 9 },
    });
    // A new syringe starts from zero: the previous syringe's totals do not count.
    expect(pumpBounds(OBSERVATIONS, 9, NOW)).toEqual({ floor: null, ceiling: null });
  });

  it('never go below the last observation of the same syringe', () => {
    const errors = validateObservationForm({ ...FILLED, attempts: 8, delivered: 5, volumeInfusedMl: 2.9 }, CONTEXT);
    expect(errors.attempts).toBe('At least 9: pump totals never go down within one syringe');
    expect(errors.delivered).toBe('At least 6: pump totals never go down within one syringe');
    expect(errors.volumeInfusedMl).toBe('At least 3: pump totals never go down within one syringe');
  });

  it('are checked each as soon as it is typed, before the others', () => {
    const empty = { ...FILLED, attempts: '', delivered: '', volumeInfusedMl: '', syringeRemainingMl: '' };
    const errors = validateObservationForm({ ...empty, attempts: 8 }, CONTEXT);
    expect(errors.attempts).toBe('At least 9: pump totals never go down within one syringe');
    expect(errors.delivered).toBe('Enter the doses delivered from the pump');
    // Delivered above the floor, attempts not typed yet: nothing to compare it with.
    expect(validateObservationForm({ ...empty, delivered: 7 }, CONTEXT).delivered).toBeUndefined();
  });

  it('entered late, are not above a later observation', () => {
    const errors = validateObservationForm({ ...FILLED, at: localInput(new Date('2026-03-03T12:30:00.000Z')), attempts: 10 }, CONTEXT);
    expect(errors.attempts).toBe('At most 9: a later observation of this syringe has 9');
  });

  it('are not more than the syringe held', () => {
    const errors = validateObservationForm({ ...FILLED, syringeRemainingMl: 60 }, CONTEXT);
    expect(errors.syringeRemainingMl).toBe('More than the 50 mL the syringe held: check the syringe');
    // The API refuses the same observation with the same words (server/test/observations.e2e-spec.ts).
    const tooMuch = validateObservationForm({ ...FILLED, volumeInfusedMl: 80, syringeRemainingMl: 0 }, CONTEXT);
    expect(tooMuch.volumeInfusedMl).toBe('More than the 50 mL the syringe held: check the pump');
  });
});

describe('the time of the observation', () => {
  it('is never in the future nor before the PCA started', () => {
    const future = new Date(NOW.getTime() + 10 * 60_000);
    expect(validateObservationForm({ ...FILLED, at: localInput(future) }, CONTEXT).at).toBe('An observation cannot be in the future');
    expect(validateObservationForm({ ...FILLED, at: localInput(new Date('2026-03-03T08:00:00.000Z')) }, CONTEXT).at).toBe(
      'An observation cannot be before the PCA started',
    );
    expect(validateObservationForm({ ...FILLED, at: 'yesterday' }, CONTEXT).at).toBe('Enter the date and time of the observation');
  });
});

describe('optional vitals', () => {
  it('asks for oxygen beside SpO2 (0 for air), a device when oxygen runs, and checks typed vitals with the server’s words', () => {
    expect(validateObservationForm({ ...FILLED, oxygenLitresPerMinute: '' }, CONTEXT).oxygenLitresPerMinute).toMatch(/0 for air/);
    expect(validateObservationForm({ ...FILLED, oxygenLitresPerMinute: 2 }, CONTEXT).oxygenDevice).toBe('Choose the oxygen device');
    expect(validateObservationForm({ ...FILLED, heartRate: 301 }, CONTEXT).heartRate).toBe('Heart rate is 0 to 300 per minute');
    expect(validateObservationForm({ ...FILLED, temperatureC: 50 }, CONTEXT).temperatureC).toBe('Temperature is 25 to 45 °C');
    expect(validateObservationForm({ ...FILLED, systolicBp: 120.5 }, CONTEXT).systolicBp).toBe(
      'Systolic blood pressure is a whole number of mmHg',
    );
  });
});

describe('toObservationRequest', () => {
  it('sends numbers, leaves the time out for "now" and drops an empty note', () => {
    expect(toObservationRequest({ ...FILLED, painScore: '4', note: '  ' })).toEqual({
      painScore: 4,
      sedationLevel: '3',
      respiratoryRate: 12,
      spo2: 95,
      attempts: 9,
      delivered: 6,
      volumeInfusedMl: 3.5,
      syringeRemainingMl: 46.5,
      oxygenLitresPerMinute: 0,
    });
  });

  it('sends the optional vitals that were typed, the device only with oxygen running', () => {
    const request = toObservationRequest({
      ...FILLED,
      oxygenLitresPerMinute: 2,
      oxygenDevice: 'nasal-cannula',
      heartRate: 88,
      systolicBp: 118,
      temperatureC: 37.4,
      consciousness: 'alert',
    });
    expect(request).toMatchObject({
      oxygenLitresPerMinute: 2,
      oxygenDevice: 'nasal-cannula',
      heartRate: 88,
      systolicBp: 118,
      temperatureC: 37.4,
      consciousness: 'alert',
    });
    expect(toObservationRequest({ ...FILLED, oxygenDevice: 'simple-mask' }).oxygenDevice).toBeUndefined();
  });

  it('sends a typed time as ISO and a trimmed note', () => {
    const request = toObservationRequest({ ...FILLED, at: '2026-03-03T12:30', note: ' Rousable to voice ' });
    expect(request.at).toBe((readLocalDateTime('2026-03-03T12:30') as Date).toISOString());
    expect(request.note).toBe('Rousable to voice');
  });
});
