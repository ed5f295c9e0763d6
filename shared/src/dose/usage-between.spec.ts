import { describe, expect, it } from 'vitest';
import type { PumpReading } from './types.js';
import { usageBetween } from './usage-between.js';
import { volumeToDose } from './volume-to-dose.js';

const reading = (at: string, attempts: number, delivered: number, volumeInfusedMl: number): PumpReading => ({
  at,
  attempts,
  delivered,
  volumeInfusedMl,
});

// Differences of cumulative pump totals are the definition; attempts, delivered and volume
// infused are the pump totals a nurse records with each observation. Usage kept as 24-hour
// rolling figures [practice].
describe('usageBetween', () => {
  it('gives attempts, delivered, their ratio, volume and hours between two readings', () => {
    const usage = usageBetween(reading('2026-03-01T08:00:00Z', 10, 8, 8.4), reading('2026-03-01T12:00:00Z', 40, 20, 20.1));
    expect(usage).toEqual({ attempts: 30, delivered: 12, ratio: 2.5, volumeMl: 11.7, hours: 4 });
  });

  it('gives the dose through the concentration', () => {
    // Morphine 1 mg/mL standard concentration [practice; ASHP Standardize 4 Safety].
    const usage = usageBetween(reading('2026-03-01T00:00:00Z', 0, 0, 0), reading('2026-03-02T00:00:00Z', 30, 24, 24));
    expect(usage.hours).toBe(24);
    expect(volumeToDose(usage.volumeMl, 1)).toBe(24);
  });

  it('has no ratio when nothing was delivered', () => {
    const usage = usageBetween(reading('2026-03-01T08:00:00Z', 5, 5, 5), reading('2026-03-01T08:30:00Z', 9, 5, 5));
    expect(usage.ratio).toBeNull();
    expect(usage.attempts).toBe(4);
    expect(usage.hours).toBe(0.5);
  });

  it('gives NaN, not a negative use, when a counter went backwards or a time is unreadable', () => {
    const usage = usageBetween(reading('2026-03-01T08:00:00Z', 50, 30, 30), reading('2026-03-01T09:00:00Z', 2, 1, 1));
    expect(usage.attempts).toBeNaN();
    expect(usage.delivered).toBeNaN();
    expect(usage.ratio).toBeNull();
    expect(usage.volumeMl).toBeNaN();
    expect(usage.hours).toBe(1);
    expect(usageBetween(reading('not a time', 0, 0, 0), reading('2026-03-01T09:00:00Z', 1, 1, 1)).hours).toBeNaN();
    expect(usageBetween(reading('2026-03-01T10:00:00Z', 0, 0, 0), reading('2026-03-01T09:00:00Z', 1, 1, 1)).hours).toBeNaN();
  });
});
