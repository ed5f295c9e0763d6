import { describe, expect, it } from 'vitest';
import { createObservationSchema, OXYGEN_REQUIRED_MESSAGE } from './observations-requests.schema.js';
import { oxygenErrors } from './oxygen.js';

const READING = {
  painScore: 3,
  sedationLevel: '1',
  respiratoryRate: 14,
  spo2: 96,
  attempts: 2,
  delivered: 2,
  volumeInfusedMl: 2,
  syringeRemainingMl: 48,
};

describe('oxygen beside SpO2', () => {
  it('is required in the request, 0 meaning air, with a message naming the field', () => {
    const missing = createObservationSchema.safeParse(READING);
    expect(missing.success).toBe(false);
    expect(missing.error?.issues).toEqual([expect.objectContaining({ path: ['oxygenLitresPerMinute'], message: OXYGEN_REQUIRED_MESSAGE })]);
    expect(OXYGEN_REQUIRED_MESSAGE).toBe('Record the oxygen: 0 for air, or litres per minute');
    expect(createObservationSchema.safeParse({ ...READING, oxygenLitresPerMinute: null }).error?.issues[0]?.message).toBe(
      OXYGEN_REQUIRED_MESSAGE,
    );
    expect(createObservationSchema.safeParse({ ...READING, oxygenLitresPerMinute: 0 }).success).toBe(true);
    expect(createObservationSchema.safeParse({ ...READING, oxygenLitresPerMinute: -1 }).error?.issues[0]?.message).toBe(
      'Oxygen is 0 (air) to 60 L/min',
    );
    expect(createObservationSchema.safeParse({ ...READING, oxygenLitresPerMinute: '2' }).error?.issues[0]?.message).toBe(
      'Oxygen is a number of litres per minute (0 for air)',
    );
  });

  it('needs the device when oxygen runs, and refuses one on air', () => {
    expect(oxygenErrors({ oxygenLitresPerMinute: 0 })).toEqual([]);
    expect(oxygenErrors({ oxygenLitresPerMinute: 0, oxygenDevice: null })).toEqual([]);
    expect(oxygenErrors({ oxygenLitresPerMinute: 2, oxygenDevice: 'nasal-cannula' })).toEqual([]);
    expect(oxygenErrors({ oxygenLitresPerMinute: 0.5 })).toEqual([
      { field: 'oxygenDevice', message: 'Choose the oxygen device: oxygen is running at 0.5 L/min' },
    ]);
    expect(oxygenErrors({ oxygenLitresPerMinute: 2, oxygenDevice: null })[0]?.field).toBe('oxygenDevice');
    expect(oxygenErrors({ oxygenLitresPerMinute: 0, oxygenDevice: 'simple-mask' })).toEqual([
      { field: 'oxygenDevice', message: 'On air (0 L/min) there is no oxygen device: leave it blank, or enter the litres per minute' },
    ]);
  });
});
