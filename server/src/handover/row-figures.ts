import {
  type MonitoringEvent,
  projectedEmptyAt,
  usageSummary,
  type HandoverRow,
  type SyringeReading,
  type WardPolicy,
} from '@lockstep/shared';
import type { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import type { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import type { PcaPause } from '../bedside/entities/pca-pause.entity.js';
import type { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import type { Flag } from '../flags/entities/flag.entity.js';
import type { Observation } from '../observations/entities/observation.entity.js';
import { nextObservationFor, type OrderMonitoringEvent } from '../observations/next-observation.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import type { HandoverSignoff } from './entities/handover-signoff.entity.js';

/**
 * How far back the board reads pump readings: the rolling 24 hours, and a little before them so
 * that the first reading inside the window has the reading before it to count from (readings are
 * hourly or two-hourly).
 */
export const BOARD_READINGS_HOURS = 26;

/** When the board's pump readings start for a board answered at `now`. */
export function boardReadingsFrom(now: Date): Date {
  return new Date(now.getTime() - BOARD_READINGS_HOURS * 3_600_000);
}

/** A pump reading of the last 26 hours: the only columns the usage figures need. */
export type BoardReading = Pick<Observation, 'orderId' | 'releaseId' | 'at' | 'attempts' | 'delivered' | 'volumeInfusedMl'>;

/** Everything the board fetched for a ward's orders, one list per kind. */
export type BoardInputs = {
  observations: BoardReading[];
  latest: Observation[];
  flags: Flag[];
  releases: SyringeRelease[];
  starts: BedsideCheck[];
  boluses: ClinicianBolus[];
  discrepancies: (ReleaseReconciliation & { release: SyringeRelease })[];
  signoffs: HandoverSignoff[];
  /** The orders' pauses: whether each PCA is paused, and naloxone given for the after-naloxone watch (none when not fetched). */
  pauses?: Pick<PcaPause, 'orderId' | 'resumedAt' | 'naloxoneGivenAt'>[];
  /** The latest tightening events of each order, for the monitoring schedule (none when not fetched). */
  events?: OrderMonitoringEvent[];
};

/** The same facts for one order: its share of each list. */
export type OrderInputs = BoardInputs;

/** Every list empty: a ward with no orders, or an order with nothing fetched for it. */
export function emptyInputs(): BoardInputs {
  return {
    observations: [],
    latest: [],
    flags: [],
    releases: [],
    starts: [],
    boluses: [],
    discrepancies: [],
    signoffs: [],
    pauses: [],
    events: [],
  };
}

/**
 * Each list split by order once, so building a row reads only its own order's facts rather than
 * scanning the ward's lists (a day of readings is hundreds of rows) again for every row.
 */
export function inputsByOrder(inputs: BoardInputs): Map<number, OrderInputs> {
  const byOrder = new Map<number, OrderInputs>();
  const share = (orderId: number) => {
    let mine = byOrder.get(orderId);
    if (!mine) byOrder.set(orderId, (mine = emptyInputs()));
    return mine;
  };
  for (const key of Object.keys(inputs) as (keyof BoardInputs)[]) {
    for (const item of inputs[key] ?? []) {
      const orderId =
        key === 'discrepancies' ? (item as BoardInputs['discrepancies'][number]).release.orderId : (item as { orderId: number }).orderId;
      (share(orderId)[key] as unknown[]).push(item);
    }
  }
  return byOrder;
}

/**
 * The latest tightening events the board already fetched, as the order detail reads them with
 * monitoringEvents: the latest matched check, clinician bolus (last 24 h), urgent flag (open, or
 * raised in the readings' window) and naloxone given.
 */
function boardEvents(mine: OrderInputs): MonitoringEvent[] {
  const latest = (kind: MonitoringEvent['kind'], times: (Date | null)[]): MonitoringEvent[] => {
    const max = Math.max(...times.filter((time): time is Date => time !== null).map((time) => time.getTime()));
    return Number.isFinite(max) ? [{ kind, at: new Date(max).toISOString() }] : [];
  };
  return [
    ...latest(
      'syringe_change',
      mine.starts.map((check) => check.secondAt),
    ),
    ...latest(
      'clinician_bolus',
      mine.boluses.map((bolus) => bolus.at),
    ),
    ...latest(
      'urgent_flag',
      // A flag the latest observation raised counts from the reading's time, as monitoringEvents does
      // (an earlier reading's flag is closed by the later reading either way).
      mine.flags
        .filter((flag) => flag.severity === 'urgent')
        .map((flag) => mine.latest.find((o) => o.id === flag.observationId)?.at ?? flag.raisedAt),
    ),
    ...latest(
      'naloxone',
      (mine.pauses ?? []).map((pause) => pause.naloxoneGivenAt),
    ),
  ];
}

type Figures = Pick<HandoverRow, 'lastObservation' | 'nextObservation' | 'last4h' | 'total24hDose' | 'syringe'>;

/** One order's observation, usage and syringe figures for the board, from its share of the inputs. */
export function rowFigures(order: PcaOrder, mine: OrderInputs, policy: WardPolicy, now: Date, shiftEndsAt: number): Figures {
  const last = mine.latest[0] ?? null;
  // In time order once here, so usageSummary's own sort has nothing to do.
  // A syringe's zero start counts only when no reading of it can be missing between the start and
  // the first reading fetched: otherwise its whole use before the window would count inside it.
  const readFrom = boardReadingsFrom(now).getTime();
  const readings: SyringeReading[] = [
    ...mine.starts
      .filter((check) => (check.secondAt ?? check.firstAt).getTime() >= readFrom)
      .map((check) => ({
        syringeId: check.releaseId,
        at: (check.secondAt ?? check.firstAt).toISOString(),
        attempts: 0,
        delivered: 0,
        volumeInfusedMl: 0,
      })),
    ...mine.observations.map((o) => ({
      syringeId: o.releaseId,
      at: o.at.toISOString(),
      attempts: o.attempts,
      delivered: o.delivered,
      volumeInfusedMl: o.volumeInfusedMl,
    })),
  ]
    .map((reading) => ({ reading, time: Date.parse(reading.at) }))
    .sort((x, y) => x.time - y.time)
    .map(({ reading }) => reading);
  const boluses = mine.boluses.map((bolus) => ({ at: bolus.at.toISOString(), amount: bolus.amount }));
  // The board shows no oral-morphine figure, so it needs no equianalgesic factor.
  const drug = { concentrationPerMl: order.concentrationPerMl, doseUnit: order.doseUnit, conversion: null };
  // Its rolling 24-hour total covers every reading given, whatever the hours of its buckets.
  const usage = usageSummary(readings, boluses, drug, now, 4);
  const recent = usage.totals;

  const running = mine.releases[0];
  const runningReadings = running ? readings.filter((reading) => reading.syringeId === running.id) : [];
  const projected =
    running && last && last.releaseId === running.id
      ? projectedEmptyAt(runningReadings, last.syringeRemainingMl, order.basalRatePerHour / order.concentrationPerMl)
      : null;
  return {
    lastObservation: last
      ? {
          at: last.at.toISOString(),
          painScore: last.painScore,
          sedationLevel: last.sedationLevel,
          respiratoryRate: last.respiratoryRate,
          spo2: last.spo2,
        }
      : null,
    nextObservation: nextObservationFor(order, last?.at ?? null, [...boardEvents(mine), ...(mine.events ?? [])], now, policy),
    last4h: { attempts: recent.attempts, delivered: recent.delivered, dose: recent.dose + recent.bolusDose },
    total24hDose: usage.rolling24hDose,
    syringe: {
      remainingMl: running && last && last.releaseId === running.id ? last.syringeRemainingMl : running ? running.volumeMl : null,
      projectedEmptyAt: projected,
      emptiesThisShift: projected !== null && Date.parse(projected) <= shiftEndsAt,
    },
  };
}
