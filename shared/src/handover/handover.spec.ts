import { describe, expect, it } from 'vitest';
import { compareHandoverRows, riskTier } from './handover-risk.js';
import { shiftWindow } from './shift-window.js';

const calm = {
  flags: { urgent: 0, review: 0, info: 0, open: [] },
  nextObservation: { dueAt: '', overdueMinutes: 0, severity: null },
  syringe: { remainingMl: 30, projectedEmptyAt: null, emptiesThisShift: false },
};

// The risk order is Lockstep's own design (docs/design.md, "Handover board"), not a published scale.
describe('handover risk order', () => {
  it('puts urgent flags first, then overdue observations, then syringes running out this shift', () => {
    expect(riskTier({ ...calm, flags: { ...calm.flags, urgent: 1 } })).toBe(0);
    expect(riskTier({ ...calm, nextObservation: { dueAt: '', overdueMinutes: 5, severity: 'review' } })).toBe(1);
    expect(riskTier({ ...calm, syringe: { ...calm.syringe, emptiesThisShift: true } })).toBe(2);
    expect(riskTier(calm)).toBe(3);
  });

  it('sorts beds as people read them within a tier', () => {
    const rows = [
      { riskTier: 3 as const, bed: 'H10', nextObservation: null },
      { riskTier: 3 as const, bed: 'H2', nextObservation: null },
      { riskTier: 0 as const, bed: 'H11', nextObservation: null },
    ];
    expect(rows.sort(compareHandoverRows).map((row) => row.bed)).toEqual(['H11', 'H2', 'H10']);
  });
});

describe('shiftWindow', () => {
  it('finds the day shift', () => {
    expect(shiftWindow(new Date('2026-12-02T10:00:00Z'), '07:00', '19:00')).toEqual({
      shift: 'day',
      shiftDate: '2026-12-02',
      startsAt: '2026-12-02T07:00:00.000Z',
      endsAt: '2026-12-02T19:00:00.000Z',
    });
  });

  it('dates a night shift after midnight by its start', () => {
    expect(shiftWindow(new Date('2026-12-03T02:00:00Z'), '07:00', '19:00')).toMatchObject({
      shift: 'night',
      shiftDate: '2026-12-02',
      startsAt: '2026-12-02T19:00:00.000Z',
      endsAt: '2026-12-03T07:00:00.000Z',
    });
  });
});
