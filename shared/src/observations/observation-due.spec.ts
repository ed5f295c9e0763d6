import { describe, expect, it } from 'vitest';
import { observationDue } from './observation-due.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

// Intervals are the ward policy's (local defaults 60 / 120 min; no single published interval:
// ASPMN guideline, Jarzyna et al., 2011 [memory]).
describe('observationDue', () => {
  it('uses the first-24-hours interval after a start', () => {
    expect(observationDue('2026-12-02T08:00:00Z', null, new Date('2026-12-02T08:30:00Z'), DEFAULT_WARD_POLICY)).toEqual({
      dueAt: '2026-12-02T09:00:00.000Z',
      overdueMinutes: 0,
      severity: null,
    });
  });

  it('is a review when late, urgent when more than one interval late', () => {
    expect(
      observationDue('2026-12-02T08:00:00Z', '2026-12-02T09:00:00Z', new Date('2026-12-02T10:20:00Z'), DEFAULT_WARD_POLICY),
    ).toMatchObject({ overdueMinutes: 20, severity: 'review' });
    expect(
      observationDue('2026-12-02T08:00:00Z', '2026-12-02T09:00:00Z', new Date('2026-12-02T11:01:00Z'), DEFAULT_WARD_POLICY),
    ).toMatchObject({ severity: 'urgent' });
  });

  it('uses the usual interval after the first day', () => {
    expect(
      observationDue('2026-12-01T08:00:00Z', '2026-12-02T09:00:00Z', new Date('2026-12-02T10:30:00Z'), DEFAULT_WARD_POLICY).dueAt,
    ).toBe('2026-12-02T11:00:00.000Z');
  });
});
