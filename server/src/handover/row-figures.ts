import { observationDue, projectedEmptyAt, usageSummary, type HandoverRow, type SyringeReading, type WardPolicy } from '@lockstep/shared';
import type { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import type { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import type { ReleaseReconciliation } from '../bedside/entities/release-reconciliation.entity.js';
import type { Flag } from '../flags/entities/flag.entity.js';
import type { Observation } from '../observations/entities/observation.entity.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import type { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import type { HandoverSignoff } from './entities/handover-signoff.entity.js';

/** Everything the board fetched for a ward's orders, one list per kind. */
export type BoardInputs = {
  observations: Observation[];
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
  const readings: SyringeReading[] = [
    ...inputs.starts
      .filter((check) => check.orderId === order.id)
      .map((check) => ({ syringeId: check.releaseId, at: (check.secondAt ?? check.firstAt).toISOString(), attempts: 0, delivered: 0, volumeInfusedMl: 0 })),
    ...mine.map((o) => ({ syringeId: o.releaseId, at: o.at.toISOString(), attempts: o.attempts, delivered: o.delivered, volumeInfusedMl: o.volumeInfusedMl })),
  ];
  const boluses = inputs.boluses.filter((bolus) => bolus.orderId === order.id).map((bolus) => ({ at: bolus.at.toISOString(), amount: bolus.amount }));
  const drug = { concentrationPerMl: order.concentrationPerMl, doseUnit: order.doseUnit, drug: order.drug.genericName };
  const day = usageSummary(readings, boluses, drug, now, 24);
  const recent = usageSummary(readings, boluses, drug, now, 4);

  const running = inputs.releases.find((release) => release.orderId === order.id);
  const runningReadings = running ? readings.filter((reading) => reading.syringeId === running.id).sort((x, y) => Date.parse(x.at) - Date.parse(y.at)) : [];
  const projected = running && last && last.releaseId === running.id ? projectedEmptyAt(runningReadings, last.syringeRemainingMl, order.basalRatePerHour / order.concentrationPerMl) : null;
  return {
    lastObservation: last ? { at: last.at.toISOString(), painScore: last.painScore, sedationLevel: last.sedationLevel, respiratoryRate: last.respiratoryRate, spo2: last.spo2 } : null,
    nextObservation: order.status === 'active' && order.startedAt ? observationDue(order.startedAt.toISOString(), last?.at.toISOString() ?? null, now, policy) : null,
    last4h: { attempts: recent.totals.attempts, delivered: recent.totals.delivered, dose: recent.totals.dose + recent.totals.bolusDose },
    total24hDose: day.rolling24hDose,
    syringe: {
      remainingMl: running && last && last.releaseId === running.id ? last.syringeRemainingMl : running ? running.volumeMl : null,
      projectedEmptyAt: projected,
      emptiesThisShift: projected !== null && Date.parse(projected) <= shiftEndsAt,
    },
  };
}
