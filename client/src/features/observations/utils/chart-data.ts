import { formatDose, withoutFloatNoise, type SedationLevel, type UsageBucket, type ObservationResponse } from '@lockstep/shared';
import { formatClock } from '@/utils/clock';
import { sedationToNumber } from './sedation';

const HOUR = 3_600_000;

export type HourBar = { start: string; hour: string; attempts: number; delivered: number };

export type CumulativePoint = { at: string; time: string; dose: number; cumulative: number };

export type ObservationPoint = { at: string; time: string; pain: number; sedation: number; sedationLevel: SedationLevel };

/** Attempts and delivered doses in each hour of the window, labelled by the hour's start. */
export function attemptsPerHour(buckets: readonly UsageBucket[], timeZone?: string): HourBar[] {
  return buckets.map((bucket) => ({
    start: bucket.start,
    hour: formatClock(bucket.start, timeZone),
    attempts: bucket.attempts,
    delivered: bucket.delivered,
  }));
}

/**
 * The running total of the dose given (PCA doses and clinician boluses) at the end of each hour,
 * from zero at the start of the window; `dose` is what was given in the hour that ended there.
 */
export function cumulativeDose(buckets: readonly UsageBucket[], timeZone?: string): CumulativePoint[] {
  const first = buckets[0];
  if (!first) return [];
  const points: CumulativePoint[] = [{ at: first.start, time: formatClock(first.start, timeZone), dose: 0, cumulative: 0 }];
  let running = 0;
  for (const bucket of buckets) {
    const end = new Date(Date.parse(bucket.start) + HOUR).toISOString();
    const dose = withoutFloatNoise(bucket.dose + bucket.bolusDose);
    running = withoutFloatNoise(running + dose);
    points.push({ at: end, time: formatClock(end, timeZone), dose, cumulative: running });
  }
  return points;
}

/** The window the hourly buckets cover: from the first bucket's start to the end of the last. */
export function bucketWindow(buckets: readonly UsageBucket[]): { start: string; end: string } | null {
  const first = buckets[0];
  const last = buckets.at(-1);
  if (!first || !last) return null;
  return { start: first.start, end: new Date(Date.parse(last.start) + HOUR).toISOString() };
}

/** Pain and sedation of the observations inside the window, oldest first; sedation S is 0. */
export function painAndSedation(
  observations: readonly ObservationResponse[],
  window: { start: string; end: string } | null,
  timeZone?: string,
): ObservationPoint[] {
  if (!window) return [];
  const [from, to] = [Date.parse(window.start), Date.parse(window.end)];
  return observations
    .filter((observation) => {
      const at = Date.parse(observation.at);
      return at >= from && at < to;
    })
    .sort((a, b) => Date.parse(a.at) - Date.parse(b.at))
    .map((observation) => ({
      at: observation.at,
      time: formatClock(observation.at, timeZone),
      pain: observation.painScore,
      sedation: sedationToNumber(observation.sedationLevel),
      sedationLevel: observation.sedationLevel,
    }));
}

const plural = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

// Text alternatives: what a person reading the chart would take from it, in one or two sentences.

export function attemptsSummary(bars: readonly HourBar[]): string {
  const attempts = bars.reduce((sum, bar) => sum + bar.attempts, 0);
  const delivered = bars.reduce((sum, bar) => sum + bar.delivered, 0);
  const span = `In the ${plural(bars.length, 'hour', 'hours')} shown`;
  if (attempts === 0 && delivered === 0) return `${span}: no attempts and no doses delivered.`;
  const busiest = bars.reduce((top, bar) => (bar.attempts > top.attempts ? bar : top), bars[0]);
  return `${span}: ${plural(attempts, 'attempt', 'attempts')}, ${plural(delivered, 'dose', 'doses')} delivered. Most attempts in the hour from ${busiest.hour} (${busiest.attempts}).`;
}

export function painAndSedationSummary(points: readonly ObservationPoint[]): string {
  if (points.length === 0) return 'No observations in the hours shown.';
  const latest = points[points.length - 1];
  const highestPain = Math.max(...points.map((point) => point.pain));
  const mostSedated = points.reduce((top, point) => (point.sedation > top.sedation ? point : top), points[0]);
  return `${plural(points.length, 'observation', 'observations')} in the hours shown. Latest at ${latest.time}: pain ${latest.pain}/10, sedation ${latest.sedationLevel}. Highest pain ${highestPain}/10; most sedated: ${mostSedated.sedationLevel} at ${mostSedated.time}.`;
}

export function cumulativeSummary(points: readonly CumulativePoint[], doseUnit: string): string {
  const total = points.at(-1)?.cumulative ?? 0;
  const hours = Math.max(0, points.length - 1);
  return `${formatDose(total, doseUnit)} given in the ${plural(hours, 'hour', 'hours')} shown (PCA doses and clinician boluses).`;
}
