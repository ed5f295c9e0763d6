import type { OrderStatus, SyringeReleaseResponse } from '@lockstep/shared';

/** Where an order's syringes stand: one running, one ready to start, or neither. */
export type SyringeState = 'running' | 'ready' | 'none';

export function syringeState(releases: readonly Pick<SyringeReleaseResponse, 'status'>[]): SyringeState {
  if (releases.some((release) => release.status === 'in_use')) return 'running';
  if (releases.some((release) => release.status === 'ready')) return 'ready';
  return 'none';
}

export function runningSyringe<T extends Pick<SyringeReleaseResponse, 'status'>>(releases: readonly T[]): T | undefined {
  return releases.find((release) => release.status === 'in_use');
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

/** A line under the status that says what the order is waiting for, or null when it is running. */
export function bedsideHint(status: OrderStatus, syringes: SyringeState | undefined): string | null {
  if (status === 'verified') {
    if (syringes === 'none') return 'Waiting for pharmacy to release a syringe';
    return 'Needs a bedside check to start';
  }
  if (status === 'active' && syringes !== undefined && syringes !== 'running') {
    return syringes === 'ready' ? 'Syringe changed: bedside check for the new syringe' : 'No syringe running: waiting for pharmacy';
  }
  return null;
}
