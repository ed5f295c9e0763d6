import { describe, expect, it } from 'vitest';
import { MONITORING_EVENT_KINDS, observationSchedule, type MonitoringEvent } from './observation-schedule.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

// Defaults: every 15 minutes for the first hour after a tightening event, then hourly in the first
// 24 hours, then 2-hourly — common practice; the ASPMN guideline (Jarzyna D et al., Pain Manag Nurs
// 2011;12(3):118-145) says monitoring intensity follows risk, with no single interval. At least 2 hours
// of close observation after naloxone: common practice.
const policy = DEFAULT_WARD_POLICY;
const START = '2026-12-02T08:00:00.000Z';
const at = (time: string) => `2026-12-02T${time}:00.000Z`;
const schedule = (events: MonitoringEvent[], lastReadingAt: string | null, now = at('08:05')) =>
  observationSchedule({ startedAt: START, events, lastReadingAt }, new Date(now), policy);

describe('observationSchedule', () => {
  it('is every 15 minutes in the first hour after a start, then hourly once a reading is taken after the hour', () => {
    const start: MonitoringEvent[] = [{ kind: 'start', at: START }];
    expect(schedule(start, null)).toMatchObject({ dueAt: at('08:15'), close: true, intervalMinutes: 15 });
    expect(schedule(start, at('08:45')).dueAt).toBe(at('09:00'));
    expect(schedule(start, at('09:00'))).toMatchObject({ dueAt: at('10:00'), close: false, intervalMinutes: 60 });
  });

  it.each(MONITORING_EVENT_KINDS.filter((kind) => kind !== 'urgent_flag' && kind !== 'naloxone'))(
    'tightens after a %s at 12:00 until a reading at or after 13:00',
    (kind) => {
      const events: MonitoringEvent[] = [
        { kind: 'start', at: START },
        { kind, at: at('12:00') },
      ];
      expect(schedule(events, at('11:30'), at('12:01'))).toMatchObject({ dueAt: at('12:15'), close: true });
      expect(schedule(events, at('12:50'), at('12:51')).dueAt).toBe(at('13:05'));
      expect(schedule(events, at('13:00'), at('13:01'))).toMatchObject({ dueAt: at('14:00'), close: false });
    },
  );

  it('tightens after an urgent flag and relaxes only after a reading without one', () => {
    // Reading at 12:00 raised an urgent flag (recorded 12:02): due 12:17.
    const events: MonitoringEvent[] = [
      { kind: 'start', at: at('02:00') },
      { kind: 'urgent_flag', at: at('12:02') },
    ];
    expect(schedule(events, at('12:00'), at('12:03'))).toMatchObject({ dueAt: at('12:17'), close: true });
    // The next reading raised another urgent flag after itself: still close.
    const again: MonitoringEvent[] = [...events, { kind: 'urgent_flag', at: at('12:17') }];
    expect(schedule(again, at('12:17'), at('12:18'))).toMatchObject({ dueAt: at('12:32'), close: true });
    // A reading without urgent flags relaxes it.
    expect(schedule(again, at('12:32'), at('12:33'))).toMatchObject({ dueAt: at('13:32'), close: false });
  });

  it('keeps close observation for 2 hours after naloxone, and until a reading after them', () => {
    const events: MonitoringEvent[] = [
      { kind: 'start', at: at('02:00') },
      { kind: 'naloxone', at: at('10:00') },
    ];
    expect(schedule(events, at('11:45'), at('11:46'))).toMatchObject({ dueAt: at('12:00'), close: true });
    expect(schedule(events, at('12:00'), at('12:01'))).toMatchObject({ dueAt: at('13:00'), close: false });
  });

  it('follows the ward’s close-observation settings: its interval, its period and its naloxone period', () => {
    // A ward tighter than the defaults (within WARD_POLICY_FLOORS): every 10 minutes, for 90 minutes, 3 hours after naloxone.
    const ward = { ...policy, closeObservationIntervalMinutes: 10, closeObservationPeriodMinutes: 90, naloxoneClosePeriodMinutes: 180 };
    const on = (events: MonitoringEvent[], lastReadingAt: string | null, now: string) =>
      observationSchedule({ startedAt: at('02:00'), events, lastReadingAt }, new Date(now), ward);
    const bolus: MonitoringEvent[] = [{ kind: 'clinician_bolus', at: at('10:00') }];
    expect(on(bolus, at('11:20'), at('11:21'))).toMatchObject({ dueAt: at('11:30'), close: true, intervalMinutes: 10 });
    expect(on(bolus, at('11:30'), at('11:31'))).toMatchObject({ dueAt: at('12:30'), close: false });
    const naloxone: MonitoringEvent[] = [{ kind: 'naloxone', at: at('10:00') }];
    expect(on(naloxone, at('12:30'), at('12:31'))).toMatchObject({ dueAt: at('12:40'), close: true });
    expect(on(naloxone, at('13:00'), at('13:01'))).toMatchObject({ dueAt: at('14:00'), close: false });
  });

  it('is a review when late and urgent when more than one interval late', () => {
    const events: MonitoringEvent[] = [{ kind: 'start', at: START }];
    expect(schedule(events, null, at('08:20'))).toMatchObject({ overdueMinutes: 5, severity: 'review' });
    expect(schedule(events, null, at('08:31'))).toMatchObject({ severity: 'urgent' });
  });

  it('uses the usual interval after the first day', () => {
    expect(
      observationSchedule({ startedAt: '2026-12-01T08:00:00Z', events: [], lastReadingAt: at('09:00') }, new Date(at('09:30')), policy)
        .dueAt,
    ).toBe(at('11:00'));
  });
});
