import { observationDue, projectedEmptyAt, usageSummary, type HandoverRow, type SyringeReading, type WardPolicy } from '@lockstep/shared';
import type { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import type { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import type { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import type { Flag } from '../flags/entities/flag.entity.js';
import type { Observation } from '../observations/entities/observation.entity.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import type { HandoverSignoff } from './entities/handover-signoff.entity.js';

/** A pump reading of the last 24 hours: the only columns the usage figures need. */
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
};

type Figures = Pick<HandoverRow, 'lastObservation' | 'nextObservation' | 'last4h' | 'total24hDose' | 'syringe'>;

/** One order's observation, usage and syringe figures for the board, from the fetched inputs. */
export function rowFigures(order: PcaOrder, inputs: BoardInputs, policy: WardPolicy, now: Date, shiftEndsAt: number): Figures {
  const mine = inputs.observations.filter((observation) => observation.orderId === order.id);
  const last = inputs.latest.find((observation) => observation.orderId === order.id) ?? null;
  // In time order once here, so usageSummary's own sort has nothing to do.
  const readings: SyringeReading[] = [
    ...inputs.starts
      .filter((check) => check.orderId === order.id)
      .map((check) => ({ syringeId: check.releaseId, at: (check.secondAt ?? check.firstAt).toISOString(), attempts: 0, delivered: 0, volumeInfusedMl: 0 })),
    ...mine.map((o) => ({ syringeId: o.releaseId, at: o.at.toISOString(), attempts: o.attempts, delivered: o.delivered, volumeInfusedMl: o.volumeInfusedMl })),
  ]
    .map((reading) => ({ reading, time: Date.parse(reading.at) }))
    .sort((x, y) => x.time - y.time)
    .map(({ reading }) => reading);
  const boluses = inputs.boluses.filter((bolus) => bolus.orderId === order.id).map((bolus) => ({ at: bolus.at.toISOString(), amount: bolus.amount }));
  const drug = { concentrationPerMl: order.concentrationPerMl, doseUnit: order.doseUnit, drug: order.drug.genericName };
  // Its rolling 24-hour total covers every reading given, whatever the hours of its buckets.
  const usage = usageSummary(readings, boluses, drug, now, 4);
  const recent = usage.totals;

  const running = inputs.releases.find((release) => release.orderId === order.id);
  const runningReadings = running ? readings.filter((reading) => reading.syringeId === running.id) : [];
  const projected = running && last && last.releaseId === running.id ? projectedEmptyAt(runningReadings, last.syringeRemainingMl, order.basalRatePerHour / order.concentrationPerMl) : null;
  return {
    lastObservation: last ? { at: last.at.toISOString(), painScore: last.painScore, sedationLevel: last.sedationLevel, respiratoryRate: last.respiratoryRate, spo2: last.spo2 } : null,
    nextObservation: order.status === 'active' && order.startedAt ? observationDue(order.startedAt.toISOString(), last?.at.toISOString() ?? null, now, policy) : null,
    last4h: { attempts: recent.attempts, delivered: recent.delivered, dose: recent.dose + recent.bolusDose },
    total24hDose: usage.rolling24hDose,
    syringe: {
      remainingMl: running && last && last.releaseId === running.id ? last.syringeRemainingMl : running ? running.volumeMl : null,
      projectedEmptyAt: projected,
      emptiesThisShift: projected !== null && Date.parse(projected) <= shiftEndsAt,
    },
  };
}
