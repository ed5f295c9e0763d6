import type { OrderListEntry } from '@lockstep/shared';

/** Running PCAs with a next observation, soonest (most overdue) first; ties by bed. */
export function observationsDue(orders: readonly OrderListEntry[]): OrderListEntry[] {
  return orders
    .filter((order) => order.status === 'active' && order.nextObservation !== null)
    .map((order) => ({ order, due: Date.parse(order.nextObservation?.dueAt ?? '') }))
    .sort((a, b) => a.due - b.due || a.order.bed.localeCompare(b.order.bed, undefined, { numeric: true }))
    .map(({ order }) => order);
}

/** Orders with open urgent flags, most flags first: the prescriber's notifications. */
export function urgentNotifications(orders: readonly OrderListEntry[]): OrderListEntry[] {
  return orders.filter((order) => order.openUrgentFlags > 0).sort((a, b) => b.openUrgentFlags - a.openUrgentFlags || a.id - b.id);
}

/** "1 urgent flag open", "2 urgent flags open". */
export function urgentFlagsLabel(count: number): string {
  return `${count} urgent flag${count === 1 ? '' : 's'} open`;
}

/** Each patient's running PCAs, for the patient list's alerts column. */
export function ordersByPatient(orders: readonly OrderListEntry[]): Map<number, OrderListEntry[]> {
  const byPatient = new Map<number, OrderListEntry[]>();
  for (const order of orders) byPatient.set(order.patientId, [...(byPatient.get(order.patientId) ?? []), order]);
  return byPatient;
}
