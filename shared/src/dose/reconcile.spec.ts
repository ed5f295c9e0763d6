import { describe, expect, it } from 'vitest';
import { reconcile } from './reconcile.js';

// Dispensed should equal infused plus wasted [practice; ASHP Guidelines on Preventing Diversion
// of Controlled Substances, 2022, as summarised]. Syringes of 20 to 60 mL are usual [practice].
describe('reconcile', () => {
  it('balances when dispensed equals infused plus wasted', () => {
    expect(reconcile(30, 24, 6, 0)).toEqual({ discrepancyMl: 0, mustReport: false });
  });

  it('gives a signed discrepancy without float noise', () => {
    expect(reconcile(30, 24.1, 5.6, 0.5)).toEqual({ discrepancyMl: 0.3, mustReport: false }); // raw: 0.29999999999999893
    expect(reconcile(30, 25, 6, 0.5)).toEqual({ discrepancyMl: -1, mustReport: true });
    expect(reconcile(60, 50, 2.5, 1)).toEqual({ discrepancyMl: 7.5, mustReport: true });
  });

  it('reports only a discrepancy above the tolerance', () => {
    expect(reconcile(30, 29.5, 0, 0.5).mustReport).toBe(false); // exactly at the tolerance
    expect(reconcile(30, 29.4, 0, 0.5).mustReport).toBe(true);
    expect(reconcile(30, 30.5, 0, 0.5).mustReport).toBe(false);
    expect(reconcile(30, 30.6, 0, 0.5).mustReport).toBe(true);
  });

  it('reports what cannot be worked out and treats a bad tolerance as 0', () => {
    expect(reconcile(Number.NaN, 10, 0, 1)).toEqual({ discrepancyMl: Number.NaN, mustReport: true });
    expect(reconcile(30, -1, 0, 1).mustReport).toBe(true);
    expect(reconcile(30, 29.9, 0, -5)).toEqual({ discrepancyMl: 0.1, mustReport: true });
    expect(reconcile(30, 29.9, 0, Number.NaN).mustReport).toBe(true);
  });
});
