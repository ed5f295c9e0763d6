import { describe, expect, it } from 'vitest';
import { canCancel, canTransition, ORDER_STATUSES, ORDER_TRANSITIONS } from './order-status.js';
import { regimenTypeOf } from './order.schema.js';

// The lifecycle is Lockstep's own design (docs/design.md, "Order lifecycle"); these checks pin it down.
describe('order lifecycle', () => {
  it('runs the main path', () => {
    expect(canTransition('awaiting_verification', 'verified')).toBe(true);
    expect(canTransition('verified', 'active')).toBe(true);
    expect(canTransition('active', 'discontinued')).toBe(true);
  });

  it('never leaves an ended status', () => {
    for (const ended of ['discontinued', 'rejected', 'cancelled', 'superseded'] as const) {
      expect(ORDER_TRANSITIONS[ended]).toEqual([]);
    }
  });

  it('never verifies twice, nor cancels a running order', () => {
    expect(canTransition('verified', 'verified')).toBe(false);
    expect(canTransition('active', 'cancelled')).toBe(false);
  });

  it('lets the prescriber cancel until the order runs, as the lifecycle says', () => {
    expect(ORDER_STATUSES.filter(canCancel)).toEqual(['awaiting_verification', 'verified', 'returned']);
  });

  it('calls a regimen with a basal rate demand + basal', () => {
    expect([regimenTypeOf(0), regimenTypeOf(0.5)]).toEqual(['demand_only', 'demand_basal']);
  });

  it('names only known statuses', () => {
    for (const targets of Object.values(ORDER_TRANSITIONS)) {
      for (const target of targets) expect(ORDER_STATUSES).toContain(target);
    }
  });
});
