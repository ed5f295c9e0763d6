import { describe, expect, it } from 'vitest';
import type { UsageBucket, ObservationResponse } from '@lockstep/shared';
import {
  attemptsPerHour,
  attemptsSummary,
  bucketWindow,
  cumulativeDose,
  cumulativeSummary,
  painAndSedation,
  painAndSedationSummary,
} from './chart-data';

const UTC = 'UTC';
const bucket = (start: string, attempts: number, delivered: number, dose: number, bolusDose = 0): UsageBucket => ({
  start,
  attempts,
  delivered,
  dose,
  bolusDose,
});
const BUCKETS = [
  bucket('2026-03-03T12:00:00.000Z', 0, 0, 0),
  bucket('2026-03-03T13:00:00.000Z', 6, 4, 0.1 + 0.2, 0.2),
  bucket('2026-03-03T14:00:00.000Z', 2, 2, 0.4),
];

function observation(at: string, painScore: number, sedationLevel: ObservationResponse['sedationLevel']): ObservationResponse {
  return {
    id: 1,
    orderId: 1,
    releaseId: 1,
    at,
    painScore,
    sedationLevel,
    respiratoryRate: 14,
    spo2: 96,
    attempts: 0,
    delivered: 0,
    volumeInfusedMl: 0,
    syringeRemainingMl: 50,
    note: '',
    oxygenLitresPerMinute: null,
    oxygenDevice: null,
    heartRate: null,
    systolicBp: null,
    temperatureC: null,
    consciousness: null,
    news2: null,
    news2NotScored: null,
    recordedByName: 'Kai Mendes',
  };
}

describe('attempts and delivered per hour', () => {
  it('labels each hour by its start on a 24-hour clock', () => {
    expect(attemptsPerHour(BUCKETS, UTC)).toEqual([
      { start: '2026-03-03T12:00:00.000Z', hour: '12:00', attempts: 0, delivered: 0 },
      { start: '2026-03-03T13:00:00.000Z', hour: '13:00', attempts: 6, delivered: 4 },
      { start: '2026-03-03T14:00:00.000Z', hour: '14:00', attempts: 2, delivered: 2 },
    ]);
  });

  it('sums the window in words', () => {
    expect(attemptsSummary(attemptsPerHour(BUCKETS, UTC))).toBe(
      'In the 3 hours shown: 8 attempts, 6 doses delivered. Most attempts in the hour from 13:00 (6).',
    );
    expect(attemptsSummary(attemptsPerHour([BUCKETS[0]], UTC))).toBe('In the 1 hour shown: no attempts and no doses delivered.');
  });
});

describe('cumulative dose', () => {
  it('adds PCA doses and clinician boluses at the end of each hour from zero, without float noise', () => {
    const points = cumulativeDose(BUCKETS, UTC);
    expect(points.map((point) => point.time)).toEqual(['12:00', '13:00', '14:00', '15:00']);
    expect(points.map((point) => point.dose)).toEqual([0, 0, 0.5, 0.4]);
    expect(points.map((point) => point.cumulative)).toEqual([0, 0, 0.5, 0.9]);
    expect(cumulativeDose([])).toEqual([]);
    expect(cumulativeSummary(points, 'mg')).toBe('0.9 mg given in the 3 hours shown (PCA doses and clinician boluses).');
    expect(cumulativeSummary([], 'mcg')).toBe('0 mcg given in the 0 hours shown (PCA doses and clinician boluses).');
  });
});

describe('pain and sedation over time', () => {
  const window = bucketWindow(BUCKETS);

  it('covers the buckets from the first start to the end of the last hour', () => {
    expect(window).toEqual({ start: '2026-03-03T12:00:00.000Z', end: '2026-03-03T15:00:00.000Z' });
    expect(bucketWindow([])).toBeNull();
  });

  it('keeps the observations inside the window, oldest first, with S as 0 and the level kept', () => {
    const points = painAndSedation(
      [
        observation('2026-03-03T14:30:00.000Z', 4, '3'),
        observation('2026-03-03T11:59:00.000Z', 8, '1'),
        observation('2026-03-03T12:15:00.000Z', 6, 'S'),
        observation('2026-03-03T15:00:00.000Z', 2, '2'),
      ],
      window,
      UTC,
    );
    expect(points).toEqual([
      { at: '2026-03-03T12:15:00.000Z', time: '12:15', pain: 6, sedation: 0, sedationLevel: 'S' },
      { at: '2026-03-03T14:30:00.000Z', time: '14:30', pain: 4, sedation: 3, sedationLevel: '3' },
    ]);
    expect(painAndSedationSummary(points)).toBe(
      '2 observations in the hours shown. Latest at 14:30: pain 4/10, sedation 3. Highest pain 6/10; most sedated: 3 at 14:30.',
    );
    expect(painAndSedationSummary([])).toBe('No observations in the hours shown.');
    expect(painAndSedation([observation('2026-03-03T12:15:00.000Z', 6, 'S')], null)).toEqual([]);
  });
});
