import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY } from '@lockstep/shared';
import type { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { type BoardReading, emptyInputs, rowFigures } from './row-figures.js';

const HOUR = 3_600_000;
const now = new Date('2026-12-03T12:00:00Z');
const ago = (hours: number) => new Date(now.getTime() - hours * HOUR);

// Invented test values: morphine 1 mg/mL, so mL and mg are the same number.
const order = {
  id: 1,
  status: 'active',
  concentrationPerMl: 1,
  doseUnit: 'mg',
  basalRatePerHour: 0,
  startedAt: ago(30),
  drug: { genericName: 'morphine' },
} as unknown as PcaOrder;
const reading = (hoursAgo: number, volumeInfusedMl: number): BoardReading => ({
  orderId: 1,
  releaseId: 7,
  at: ago(hoursAgo),
  attempts: volumeInfusedMl,
  delivered: volumeInfusedMl,
  volumeInfusedMl,
});

describe('rowFigures', () => {
  it('counts only use inside the 24 hours when a syringe started before the readings fetched (no reading just before the window)', () => {
    const mine = {
      ...emptyInputs(),
      // Started 30 hours ago; readings missed for a while, then 20 mL by 23 hours ago and 26 mL by 1 hour ago.
      starts: [{ orderId: 1, releaseId: 7, firstAt: ago(30), secondAt: ago(30) } as BedsideCheck],
      observations: [reading(23, 20), reading(1, 26)],
      releases: [{ id: 7, orderId: 1, volumeMl: 50 } as SyringeRelease],
    };
    const figures = rowFigures(order, mine, DEFAULT_WARD_POLICY, now, now.getTime() + 6 * HOUR);
    // Not 26: the 20 mL given before the first reading fetched cannot be placed inside the window.
    expect(figures.total24hDose).toBe(6);
  });

  it('counts from the syringe’s zero start when it started inside the readings fetched', () => {
    const mine = {
      ...emptyInputs(),
      starts: [{ orderId: 1, releaseId: 7, firstAt: ago(10), secondAt: ago(10) } as BedsideCheck],
      observations: [reading(9, 2), reading(1, 12)],
      releases: [{ id: 7, orderId: 1, volumeMl: 50 } as SyringeRelease],
    };
    expect(rowFigures(order, mine, DEFAULT_WARD_POLICY, now, now.getTime() + 6 * HOUR).total24hDose).toBe(12);
  });
});
