import { z } from 'zod';

export const ORDER_STATUSES = [
  'awaiting_verification',
  'verified',
  'active',
  'discontinued',
  'returned',
  'rejected',
  'cancelled',
  'superseded',
] as const;
export const orderStatusSchema = z.enum(ORDER_STATUSES);
export type OrderStatus = z.infer<typeof orderStatusSchema>;

export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  awaiting_verification: 'Awaiting verification',
  verified: 'Verified',
  active: 'Active',
  discontinued: 'Discontinued',
  returned: 'Returned with a query',
  rejected: 'Rejected',
  cancelled: 'Cancelled',
  superseded: 'Superseded',
};

/**
 * The order lifecycle (docs/design.md, "Order lifecycle"): awaiting_verification → verified →
 * active → discontinued, with side exits. A returned order is revised as a new version, which
 * supersedes it. The table also lets an active order be superseded by a changed regimen; no
 * route does that yet.
 */
export const ORDER_TRANSITIONS: Readonly<Record<OrderStatus, readonly OrderStatus[]>> = {
  awaiting_verification: ['verified', 'returned', 'rejected', 'cancelled'],
  verified: ['active', 'cancelled'],
  active: ['discontinued', 'superseded'],
  returned: ['superseded', 'cancelled'],
  discontinued: [],
  rejected: [],
  cancelled: [],
  superseded: [],
};

export function canTransition(from: OrderStatus, to: OrderStatus): boolean {
  return ORDER_TRANSITIONS[from].includes(to);
}

/** A prescriber may cancel an order until it is running: wherever the lifecycle allows it. */
export function canCancel(status: OrderStatus): boolean {
  return canTransition(status, 'cancelled');
}

/** Statuses in which an order still needs someone's action or is running. */
export const OPEN_ORDER_STATUSES: readonly OrderStatus[] = ['awaiting_verification', 'verified', 'active', 'returned'];
