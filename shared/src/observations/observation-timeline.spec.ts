import { describe, expect, it } from 'vitest';
import { observationTimelineErrors, pumpTotalsAround, type ObservationTimeline } from './observation-timeline.js';

// Invented readings of a 50 mL syringe: the rules are about order and bounds, not clinical values.
const now = new Date('2026-12-03T12:00:00Z');
const calm: ObservationTimeline = {
  at: new Date('2026-12-03T11:00:00Z'),
  values: { attempts: 12, delivered: 10, volumeInfusedMl: 10, syringeRemainingMl: 40 },
  before: { attempts: 8, delivered: 7, volumeInfusedMl: 7 },
  after: null,
  syringeVolumeMl: 50,
  startedAt: new Date('2026-12-03T06:00:00Z'),
  now,
};
const fields = (timeline: Partial<ObservationTimeline>) => observationTimelineErrors({ ...calm, ...timeline }).map((error) => error.field);

describe('observationTimelineErrors', () => {
  it('accepts totals that rise within the syringe', () => {
    expect(observationTimelineErrors(calm)).toEqual([]);
  });

  it('refuses a time in the future (beyond a minute of clock skew) or before the start', () => {
    expect(fields({ at: new Date(now.getTime() + 30_000) })).toEqual([]);
    expect(observationTimelineErrors({ ...calm, at: new Date(now.getTime() + 120_000) })).toEqual([
      { field: 'at', message: 'An observation cannot be in the future' },
    ]);
    expect(fields({ at: new Date('2026-12-03T05:00:00Z') })).toEqual(['at']);
  });

  it('refuses totals below the observation before or above the one after, naming the bound', () => {
    const errors = observationTimelineErrors({
      ...calm,
      values: { ...calm.values, attempts: 7, delivered: 7, volumeInfusedMl: 6 },
      after: { attempts: 20, delivered: 15, volumeInfusedMl: 9 },
    });
    expect(errors).toEqual([
      { field: 'attempts', message: 'At least 8: pump totals never go down within one syringe' },
      { field: 'volumeInfusedMl', message: 'At least 7: pump totals never go down within one syringe' },
    ]);
    expect(observationTimelineErrors({ ...calm, after: { attempts: 11, delivered: 15, volumeInfusedMl: 15 } })).toEqual([
      { field: 'attempts', message: 'At most 11: a later observation of this syringe has 11' },
    ]);
  });

  it('refuses more doses delivered than attempted, and more than the syringe held', () => {
    expect(fields({ values: { ...calm.values, attempts: 10, delivered: 11 } })).toEqual(['delivered']);
    expect(observationTimelineErrors({ ...calm, values: { ...calm.values, volumeInfusedMl: 80, syringeRemainingMl: 60 } })).toEqual([
      { field: 'volumeInfusedMl', message: 'More than the 50 mL the syringe held: check the pump' },
      { field: 'syringeRemainingMl', message: 'More than the 50 mL the syringe held: check the syringe' },
    ]);
    expect(fields({ values: { ...calm.values, volumeInfusedMl: 80 }, syringeVolumeMl: null })).toEqual([]);
  });
});

describe('pumpTotalsAround', () => {
  const reading = (releaseId: number, at: string, attempts: number) => ({
    releaseId,
    at,
    attempts,
    delivered: attempts,
    volumeInfusedMl: attempts,
  });
  const readings = [
    reading(1, '2026-12-03T08:00:00Z', 30),
    reading(2, '2026-12-03T09:00:00Z', 2),
    reading(2, '2026-12-03T10:00:00Z', 4),
    reading(2, '2026-12-03T12:00:00Z', 9),
  ];

  it('finds the same syringe’s readings just before and just after a time', () => {
    const around = pumpTotalsAround(readings, 2, new Date('2026-12-03T11:00:00Z'));
    expect([around.before?.attempts, around.after?.attempts]).toEqual([4, 9]);
    expect(pumpTotalsAround(readings, 2, new Date('2026-12-03T08:30:00Z'))).toEqual({ before: null, after: readings[1] });
    expect(pumpTotalsAround(readings, 3, now)).toEqual({ before: null, after: null });
  });
});
