import type { OrderSummary } from '@lockstep/shared';

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** Ward, then bed as a person reads it (H2 before H10), then the newest order first. */
export function byWardAndBed(a: OrderSummary, b: OrderSummary): number {
  return collator.compare(a.wardName, b.wardName) || collator.compare(a.bed, b.bed) || b.id - a.id;
}
