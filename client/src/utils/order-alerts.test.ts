import { describe, expect, it } from 'vitest';
import type { OrderListEntry } from '@lockstep/shared';
import { observationsDue, ordersByPatient, urgentFlagsLabel, urgentNotifications } from './order-alerts';

const entry = (id: number, bed: string, dueAt: string | null, openUrgentFlags = 0, status: OrderListEntry['status'] = 'active') =>
  ({
    id,
    bed,
    status,
    openUrgentFlags,
    nextObservation: dueAt ? { dueAt, overdueMinutes: 0, severity: null } : null,
  }) as unknown as OrderListEntry;

describe('observationsDue', () => {
  it('lists running PCAs by due time, soonest first, then by bed', () => {
    const orders = [
      entry(1, 'H10', '2026-12-02T10:00:00Z'),
      entry(2, 'H2', '2026-12-02T09:15:00Z'),
      entry(3, 'H3', null, 0, 'verified'),
      entry(4, 'H1', '2026-12-02T10:00:00Z'),
    ];
    expect(observationsDue(orders).map((order) => order.id)).toEqual([2, 4, 1]);
  });
});

describe('urgentNotifications', () => {
  it('keeps only orders with open urgent flags, most first', () => {
    const orders = [entry(1, 'H1', null, 0), entry(2, 'H2', null, 1), entry(3, 'H3', null, 2)];
    expect(urgentNotifications(orders).map((order) => order.id)).toEqual([3, 2]);
    expect(urgentFlagsLabel(1)).toBe('1 urgent flag open');
    expect(urgentFlagsLabel(2)).toBe('2 urgent flags open');
  });
});

describe('ordersByPatient', () => {
  it('groups running PCAs by patient', () => {
    const a = { ...entry(1, 'H1', null), patientId: 7 } as OrderListEntry;
    const b = { ...entry(2, 'H2', null), patientId: 8 } as OrderListEntry;
    expect([...ordersByPatient([a, b]).entries()].map(([id, list]) => [id, list.map((o) => o.id)])).toEqual([
      [7, [1]],
      [8, [2]],
    ]);
  });
});
