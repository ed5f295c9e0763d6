import {
  type MonitoringEvent,
  type MonitoringEventKind,
  observationSchedule,
  type ObservationDue,
  type WardPolicy,
} from '@lockstep/shared';
import type { EntityManager } from 'typeorm';
import { storedDate } from '../database/stored-date.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { wardPolicy } from '../wards/ward-policy.js';

/** A tightening event of one order, as the schedule reads it. */
export type OrderMonitoringEvent = MonitoringEvent & { orderId: number };

/** The order's own tightening events: its start (a regimen change when it revises one) and its loading dose. */
function orderEvents(order: Pick<PcaOrder, 'startedAt' | 'version' | 'loadingDose'>): MonitoringEvent[] {
  if (!order.startedAt) return [];
  const at = order.startedAt.toISOString();
  const events: MonitoringEvent[] = [{ kind: order.version > 1 ? 'regimen_change' : 'start', at }];
  if (order.loadingDose !== null && order.loadingDose > 0) events.push({ kind: 'loading_dose', at });
  return events;
}

/**
 * The latest of each kind of tightening event recorded against these orders, in one query: the
 * latest matched two-nurse check (a syringe change, or the start itself), the latest clinician
 * bolus, the latest naloxone given and the latest urgent flag, open or acknowledged (an acknowledgement does not relax the
 * schedule; a reading without urgent flags does). A flag an observation raised counts from the reading's time, not
 * from when it was saved, so a late entry is due sooner, never later. The latest of a kind is enough: its close period
 * ends after every earlier one's.
 */
export async function monitoringEvents(manager: EntityManager, orderIds: number[]): Promise<Map<number, MonitoringEvent[]>> {
  const byOrder = new Map<number, MonitoringEvent[]>();
  if (orderIds.length === 0) return byOrder;
  const marks = orderIds.map(() => '?').join(', ');
  const rows: { orderId: number; kind: MonitoringEventKind; at: string | null }[] = await manager.query(
    `SELECT orderId, 'syringe_change' AS kind, max(secondAt) AS at FROM bedside_checks WHERE status = 'matched' AND orderId IN (${marks}) GROUP BY orderId
     UNION ALL SELECT orderId, 'clinician_bolus' AS kind, max(at) AS at FROM clinician_boluses WHERE orderId IN (${marks}) GROUP BY orderId
     UNION ALL SELECT f.orderId, 'urgent_flag' AS kind, max(coalesce(o.at, f.raisedAt)) AS at FROM flags f LEFT JOIN observations o ON o.id = f.observationId
       WHERE f.severity = 'urgent' AND f.orderId IN (${marks}) GROUP BY f.orderId
     UNION ALL SELECT orderId, 'naloxone' AS kind, max(naloxoneGivenAt) AS at FROM pca_pauses WHERE naloxoneGivenAt IS NOT NULL AND orderId IN (${marks}) GROUP BY orderId`,
    [...orderIds, ...orderIds, ...orderIds, ...orderIds],
  );
  for (const row of rows) {
    if (row.at === null) continue;
    const orderId = Number(row.orderId);
    byOrder.set(orderId, [...(byOrder.get(orderId) ?? []), { kind: row.kind, at: storedDate(row.at).toISOString() }]);
  }
  return byOrder;
}

/**
 * When a running PCA's next observation is due by its ward's policy and the shared schedule; null
 * unless it is active. Expects the patient's ward loaded unless a policy is given.
 */
export function nextObservationFor(
  order: PcaOrder,
  lastObservationAt: Date | null,
  events: MonitoringEvent[],
  now: Date,
  policy: WardPolicy = wardPolicy(order.patient.ward),
): ObservationDue | null {
  if (order.status !== 'active' || !order.startedAt) return null;
  const { dueAt, overdueMinutes, severity } = observationSchedule(
    {
      startedAt: order.startedAt.toISOString(),
      events: [...orderEvents(order), ...events],
      lastReadingAt: lastObservationAt?.toISOString() ?? null,
    },
    now,
    policy,
  );
  return { dueAt, overdueMinutes, severity };
}
