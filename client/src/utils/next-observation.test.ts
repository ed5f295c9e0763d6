import { describe, expect, it } from 'vitest';
import { formatClock, formatMinutes } from './clock';
import { describeNextObservation } from './next-observation';

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
    expect(describeNextObservation({ dueAt: '2026-03-03T14:25:00.000Z', overdueMinutes: 0, severity: null }, NOW, UTC)).toEqual({
      tone: 'ok',
      headline: 'Due at 14:25',
      detail: 'In 25 min',
    });
  });

  it('shows overdue as review, and more than one interval late as urgent', () => {
    expect(describeNextObservation({ dueAt: '2026-03-03T13:30:00.000Z', overdueMinutes: 30, severity: 'review' }, NOW, UTC)).toEqual({
      tone: 'review',
      headline: 'Overdue by 30 min',
      detail: 'Was due at 13:30',
    });
    expect(describeNextObservation({ dueAt: '2026-03-03T11:00:00.000Z', overdueMinutes: 180, severity: 'urgent' }, NOW, UTC)).toEqual({
      tone: 'urgent',
      headline: 'Overdue by 3 h',
      detail: 'Was due at 11:00: more than one interval late',
    });
  });
});
