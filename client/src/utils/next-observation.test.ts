import { describe, expect, it } from 'vitest';
import { describeNextObservation } from './next-observation';

const NOW = new Date('2026-03-03T14:00:00.000Z');
const UTC = 'UTC';

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
