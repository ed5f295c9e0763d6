import type { OrderStatus } from '../orders/order-status.js';
import type { ReleaseStatus } from '../orders/order.schema.js';

/** Where an order's syringes stand: one running, one ready to start, or neither. */
export type SyringeState = 'running' | 'ready' | 'none';

export function syringeState(releases: readonly { status: ReleaseStatus }[]): SyringeState {
  if (releases.some((release) => release.status === 'in_use')) return 'running';
  if (releases.some((release) => release.status === 'ready')) return 'ready';
  return 'none';
}

export type BedsideAction = 'check' | 'observe' | 'bolus' | 'syringe-change' | 'discontinue';

/**
 * What a nurse can do for an order now. A verified order, or an active one between syringes,
 * needs a bedside check; a running syringe allows an observation, a bolus, a change or
 * discontinuing. While the syringes are not known yet (`undefined`), the status alone decides.
 */
export function bedsideActions(status: OrderStatus, syringes: SyringeState | undefined): BedsideAction[] {
  if (status === 'verified') return ['check'];
  if (status !== 'active') return [];
  if (syringes === 'running' || syringes === undefined) return ['observe', 'bolus', 'syringe-change', 'discontinue'];
  return ['check'];
}

export function bedsideActionAllowed(action: BedsideAction, status: OrderStatus, syringes: SyringeState): boolean {
  return bedsideActions(status, syringes).includes(action);
}
