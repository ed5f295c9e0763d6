import { observationDue, type ObservationDue } from '@lockstep/shared';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { wardPolicy } from '../wards/ward-policy.js';

/** When a running PCA's next observation is due by its ward's policy; null unless it is active. Expects the patient's ward loaded. */
export function nextObservationFor(order: PcaOrder, lastObservationAt: Date | null, now: Date): ObservationDue | null {
  if (order.status !== 'active' || !order.startedAt) return null;
  return observationDue(order.startedAt.toISOString(), lastObservationAt?.toISOString() ?? null, now, wardPolicy(order.patient.ward));
}
