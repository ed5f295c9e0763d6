import { describe, expect, it } from 'vitest';
import { duplicatePcaFinding, duplicatePcaMessage, openPcaFor, otherOpioidOrders, type OtherPcaOrder } from './duplicate-therapy.js';

// One PCA per patient is the product's own rule (docs/design.md, "Duplicate therapy"): common
// practice on wards that run PCA, with no single published source for the wording.
const morphine = (id: number, status: OtherPcaOrder['status']): OtherPcaOrder => ({
  id,
  status,
  drugName: 'morphine',
  doseUnit: 'mg',
  concentrationPerMl: 1,
});

describe('openPcaFor', () => {
  it('finds an order awaiting verification, verified or running', () => {
    for (const status of ['awaiting_verification', 'verified', 'active'] as const) {
      expect(openPcaFor([morphine(7, status)])?.id).toBe(7);
    }
  });

  it('ignores finished and returned orders', () => {
    const finished = (['discontinued', 'rejected', 'cancelled', 'superseded', 'returned'] as const).map((status, i) =>
      morphine(i + 1, status),
    );
    expect(openPcaFor(finished)).toBeNull();
  });

  it('ignores the order a revision replaces', () => {
    expect(openPcaFor([morphine(4, 'awaiting_verification')], 4)).toBeNull();
  });
});

describe('otherOpioidOrders', () => {
  it('lists every unfinished order but the one in the queue', () => {
    const orders = [morphine(1, 'active'), morphine(2, 'awaiting_verification'), morphine(3, 'returned'), morphine(4, 'cancelled')];
    expect(otherOpioidOrders(orders, 2).map((order) => order.id)).toEqual([1, 3]);
  });
});

describe('duplicatePcaMessage', () => {
  it('names the open order and says what to do for its status', () => {
    expect(duplicatePcaMessage(morphine(12, 'active'))).toBe(
      'This patient already has an open PCA (order 12, morphine 1 mg/mL, active): discontinue it at the bedside before ordering another',
    );
    expect(duplicatePcaMessage({ ...morphine(5, 'verified'), drugName: 'hydromorphone', concentrationPerMl: 0.2 })).toBe(
      'This patient already has an open PCA (order 5, HYDROmorphone 0.2 mg/mL, verified): cancel it before ordering another',
    );
  });

  it('is a hard finding on the patient, so the order form blocks signing', () => {
    expect(duplicatePcaFinding(morphine(3, 'awaiting_verification'))).toMatchObject({
      field: 'patientId',
      severity: 'hard',
      code: 'duplicate.open-pca',
    });
  });
});
