import { describe, expect, it } from 'vitest';
import type { OrderSummary } from '@lockstep/shared';
import { byWardAndBed } from './order-sort';

const order = (id: number, wardName: string, bed: string) => ({ id, wardName, bed }) as OrderSummary;

describe('byWardAndBed', () => {
  it('sorts by ward, then bed in reading order, then newest first', () => {
    const sorted = [order(1, 'Harbour', 'H10'), order(2, 'Cedar', 'C03'), order(3, 'Harbour', 'H7'), order(4, 'Harbour', 'H7')].sort(
      byWardAndBed,
    );
    expect(sorted.map((o) => o.id)).toEqual([2, 4, 3, 1]);
  });
});
