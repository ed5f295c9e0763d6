import { describe, expect, it } from 'vitest';
import {
  atOrOverLimit,
  deliveryFlags,
  type DeliveryRegimen,
  mostDemandsBetweenReadings,
  VOLUME_TOLERANCE_FRACTION,
  VOLUME_TOLERANCE_ML,
} from './delivery-flags.js';

const regimen: DeliveryRegimen = {
  doseUnit: 'mg',
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  concentrationPerMl: 1,
  oneHourLimit: null,
  fourHourLimit: 30,
};
const t0 = Date.parse('2026-03-01T08:00:00.000Z');
const at = (minutes: number) => new Date(t0 + minutes * 60_000).toISOString();
const start = { at: at(0), attempts: 0, delivered: 0, volumeInfusedMl: 0 };

describe('mostDemandsBetweenReadings', () => {
  // Lockout arithmetic by definition (docs/design.md, order fields): one press, then one each lockout.
  it('counts floor(window ÷ lockout) + 1 demand doses in a window closed at both ends', () => {
    expect(mostDemandsBetweenReadings(10, 3)).toBe(1);
    expect(mostDemandsBetweenReadings(10, 10)).toBe(2);
    expect(mostDemandsBetweenReadings(10, 60)).toBe(7);
    expect(mostDemandsBetweenReadings(0, 60)).toBe(Infinity);
  });
});

describe('deliveryFlags', () => {
  it('40 doses 3 minutes after the start (lockout 10 min, 4-hour limit 30 mg) is urgent', () => {
    const flags = deliveryFlags({ at: at(3), delivered: 40, volumeInfusedMl: 40 }, start, [], regimen);
    expect(flags).toEqual([
      expect.objectContaining({
        severity: 'urgent',
        code: 'delivery.over-regimen',
        message: expect.stringMatching(
          /^Delivered more than the regimen allows: 40 doses in 3 min .*allows 1\).*40 mg within 4 hours, over the 4-hour limit of 30 mg/,
        ),
      }),
    ]);
  });

  it('doses the lockout allows and totals within the limits raise nothing', () => {
    expect(deliveryFlags({ at: at(60), delivered: 7, volumeInfusedMl: 7 }, start, [], regimen)).toEqual([]);
    expect(deliveryFlags({ at: at(60), delivered: 8, volumeInfusedMl: 8 }, start, [], regimen)[0]?.code).toBe('delivery.over-regimen');
  });

  it('totals over the 1-hour limit across earlier readings within the hour are urgent', () => {
    const earlier = [{ at: at(20), attempts: 3, delivered: 3, volumeInfusedMl: 3 }];
    const previous = { at: at(40), attempts: 5, delivered: 5, volumeInfusedMl: 5 };
    const withLimit = { ...regimen, oneHourLimit: 4 };
    // 7 − 3 = 4 mg since 20 minutes in: at the limit, not over it.
    expect(deliveryFlags({ at: at(60), delivered: 7, volumeInfusedMl: 7 }, previous, [start, ...earlier], withLimit)).toEqual([
      expect.objectContaining({ message: expect.stringContaining('7 mg within an hour, over the 1-hour limit of 4 mg') }),
    ]);
  });

  // Tolerance: the larger of 1 mL or 10 % of what the doses explain (Lockstep's own, common practice).
  it('volume infused inconsistent with doses × volume per dose + basal beyond the tolerance is a review', () => {
    expect([VOLUME_TOLERANCE_ML, VOLUME_TOLERANCE_FRACTION]).toEqual([1, 0.1]);
    const basal = { ...regimen, basalRatePerHour: 1 };
    // 6 doses + 1 mg/h basal for an hour = 7 mL at 1 mg/mL.
    expect(deliveryFlags({ at: at(60), delivered: 6, volumeInfusedMl: 8 }, start, [], basal)).toEqual([]);
    const flags = deliveryFlags({ at: at(60), delivered: 6, volumeInfusedMl: 9 }, start, [], basal);
    expect(flags).toEqual([expect.objectContaining({ severity: 'review', code: 'delivery.volume-mismatch' })]);
    // A clinician bolus of 2 mL in between explains it.
    expect(deliveryFlags({ at: at(60), delivered: 6, volumeInfusedMl: 9 }, start, [], basal, 2)).toEqual([]);
  });
});

describe('atOrOverLimit', () => {
  // The order's own 4-hour limit (docs/design.md, order fields): at the limit counts, as the board shows it.
  it('is true at or over the limit, false under it or with no limit, and never safe for a broken total', () => {
    expect(atOrOverLimit(29.9, 30)).toBe(false);
    expect(atOrOverLimit(30, 30)).toBe(true);
    expect(atOrOverLimit(40, 30)).toBe(true);
    expect(atOrOverLimit(40, null)).toBe(false);
    expect(atOrOverLimit(Number.NaN, 30)).toBe(true);
    expect(atOrOverLimit(Number.POSITIVE_INFINITY, null)).toBe(true);
    expect(atOrOverLimit(10, Number.NaN)).toBe(true);
  });
});
