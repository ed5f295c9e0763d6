import { describe, expect, it } from 'vitest';
import { DEFAULT_WARD_POLICY } from '../observations/ward-policy.js';
import { naloxoneWatch, naloxoneWatchSpan, naloxoneWatchUntil, pauseActions, pcaPaused } from './pca-pause.js';

describe('the PCA pause', () => {
  it('is paused while a pause has not been resumed', () => {
    expect(pcaPaused([])).toBe(false);
    expect(pcaPaused([{ resumedAt: '2026-01-01T10:00:00.000Z' }])).toBe(false);
    expect(pcaPaused([{ resumedAt: '2026-01-01T10:00:00.000Z' }, { resumedAt: null }])).toBe(true);
  });

  it('offers pause or resume on a running PCA, and naloxone either way', () => {
    expect(pauseActions(true, false)).toEqual(['pause', 'naloxone']);
    expect(pauseActions(true, true)).toEqual(['resume', 'naloxone']);
    expect(pauseActions(false, false)).toEqual([]);
    expect(pauseActions(false, true)).toEqual([]);
  });
});

describe('the watch after naloxone', () => {
  // Naloxone hydrochloride injection, US prescribing information (FDA label): the duration of
  // action of some opioids may exceed that of naloxone (from memory); 15 minutes for 2 hours is
  // common practice (the defaults and floors of DEFAULT_WARD_POLICY / WARD_POLICY_FLOORS).
  it('is every 15 minutes for 2 hours by default, and follows the ward', () => {
    expect(naloxoneWatch(DEFAULT_WARD_POLICY)).toEqual({ everyMinutes: 15, forMinutes: 120 });
    expect(naloxoneWatch({ closeObservationIntervalMinutes: 10, naloxoneClosePeriodMinutes: 180 })).toEqual({
      everyMinutes: 10,
      forMinutes: 180,
    });
  });

  it('runs the ward’s naloxone period from the latest dose', () => {
    expect(naloxoneWatchUntil([], DEFAULT_WARD_POLICY)).toBeNull();
    expect(naloxoneWatchUntil(['2026-01-01T10:00:00.000Z', '2026-01-01T10:30:00.000Z'], DEFAULT_WARD_POLICY)?.toISOString()).toBe(
      '2026-01-01T12:30:00.000Z',
    );
    expect(naloxoneWatchUntil(['2026-01-01T10:00:00.000Z'], { naloxoneClosePeriodMinutes: 180 })?.toISOString()).toBe(
      '2026-01-01T13:00:00.000Z',
    );
    expect(naloxoneWatchUntil(['not a time'], DEFAULT_WARD_POLICY)).toBeNull();
  });

  it('says how long it runs in words', () => {
    expect(naloxoneWatchSpan(120)).toBe('2 hours');
    expect(naloxoneWatchSpan(150)).toBe('2.5 hours');
    expect(naloxoneWatchSpan(180)).toBe('3 hours');
    expect(naloxoneWatchSpan(90)).toBe('90 minutes');
  });
});
