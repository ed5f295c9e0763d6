import { describe, expect, it } from 'vitest';
import type { ObservationResponse } from '@lockstep/shared';
import { deliveryWarning } from './delivery-warning';
import { emptyObservationForm } from './observation-form';

// Demand 1 mg, lockout 10 min, 4-hour limit 30 mg (the API tests' PCA); the lockout arithmetic is by
// definition (docs/design.md, "Order fields and dosing conventions").
const order = {
  doseUnit: 'mg',
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  concentrationPerMl: 1,
  oneHourLimit: null,
  fourHourLimit: 30,
  startedAt: '2026-12-02T10:00:00.000Z',
  releases: [{ id: 7, status: 'in_use' }],
};
const now = new Date('2026-12-02T10:03:00.000Z');
const typed = (delivered: string) => ({ ...emptyObservationForm(), delivered });

describe('deliveryWarning', () => {
  it('40 doses 3 minutes after the start warns before saving; one dose does not', () => {
    expect(deliveryWarning(typed('40'), order, [], now)).toMatch(
      /^Delivered more than the regimen allows: 40 doses in 3 min.*saving raises an urgent flag$/,
    );
    expect(deliveryWarning(typed('1'), order, [], now)).toBeUndefined();
    expect(deliveryWarning(typed(''), order, [], now)).toBeUndefined();
  });

  it('counts from the last reading of the running syringe', () => {
    const last = { releaseId: 7, at: '2026-12-02T10:01:00.000Z', attempts: 5, delivered: 5, volumeInfusedMl: 5 } as ObservationResponse;
    expect(deliveryWarning(typed('6'), order, [last], now)).toBeUndefined();
    expect(deliveryWarning(typed('7'), order, [last], now)).toMatch(/^Delivered more than the regimen allows: 2 doses in 2 min/);
  });

  it('says nothing when the previous reading is not known here (a later syringe before its first reading)', () => {
    const changed = {
      ...order,
      releases: [
        { id: 6, status: 'finished' },
        { id: 7, status: 'in_use' },
      ],
    };
    expect(deliveryWarning(typed('40'), changed, [], now)).toBeUndefined();
  });
});
