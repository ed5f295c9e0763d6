import { describe, expect, it } from 'vitest';
import { formatClock, formatMinutes } from './clock';
import { describeNextObservation, describeProjectedEmpty } from './usage-display';

const NOW = new Date('2026-03-03T14:00:00.000Z');
const UTC = 'UTC';

describe('clock and spans', () => {
  it('writes times on a 24-hour clock and spans in hours and minutes', () => {
    expect(formatClock('2026-03-03T09:05:00.000Z', UTC)).toBe('09:05');
    expect(formatClock('2026-03-03T00:00:00.000Z', UTC)).toBe('00:00');
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(120)).toBe('2 h');
    expect(formatMinutes(190)).toBe('3 h 10 min');
  });
});

describe('describeNextObservation', () => {
  it('says when the next one is due', () => {
    expect(describeNextObservation({ dueAt: '2026-03-03T14:25:00.000Z', overdueMinutes: 0, severity: null }, NOW, UTC)).toEqual({ tone: 'ok', headline: 'Due at 14:25', detail: 'In 25 min' });
  });

  it('shows overdue as review, and more than one interval late as urgent', () => {
    expect(describeNextObservation({ dueAt: '2026-03-03T13:30:00.000Z', overdueMinutes: 30, severity: 'review' }, NOW, UTC)).toEqual({ tone: 'review', headline: 'Overdue by 30 min', detail: 'Was due at 13:30' });
    expect(describeNextObservation({ dueAt: '2026-03-03T11:00:00.000Z', overdueMinutes: 180, severity: 'urgent' }, NOW, UTC)).toEqual({
      tone: 'urgent',
      headline: 'Overdue by 3 h',
      detail: 'Was due at 11:00: more than one interval late',
    });
  });
});

describe('describeProjectedEmpty', () => {
  it('gives the time and how long until then, with the date when it is far off', () => {
    expect(describeProjectedEmpty('2026-03-03T17:10:00.000Z', NOW, UTC)).toEqual({ value: 'About 17:10', detail: 'In 3 h 10 min' });
    expect(describeProjectedEmpty('2026-03-05T02:00:00.000Z', NOW, UTC)).toEqual({ value: 'About 5 Mar 2026, 02:00', detail: 'In 36 h' });
    expect(describeProjectedEmpty('2026-03-03T13:50:00.000Z', NOW, UTC)).toEqual({ value: 'About 13:50', detail: 'Already passed: check the syringe' });
    expect(describeProjectedEmpty(null, NOW, UTC)).toEqual({ value: 'Not projected yet', detail: 'Needs an observation of the running syringe' });
  });
});
