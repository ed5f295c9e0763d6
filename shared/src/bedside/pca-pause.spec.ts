import { describe, expect, it } from 'vitest';
import { NALOXONE_WATCH, naloxoneWatchUntil, pauseActions, pcaPaused } from './pca-pause.js';

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
  // common practice.
  it('is every 15 minutes for at least 2 hours', () => {
    expect(NALOXONE_WATCH).toEqual({ everyMinutes: 15, forMinutes: 120 });
  });

  it('runs 2 hours from the latest dose', () => {
    expect(naloxoneWatchUntil([])).toBeNull();
    expect(naloxoneWatchUntil(['2026-01-01T10:00:00.000Z', '2026-01-01T10:30:00.000Z'])?.toISOString()).toBe('2026-01-01T12:30:00.000Z');
    expect(naloxoneWatchUntil(['not a time'])).toBeNull();
  });
});
