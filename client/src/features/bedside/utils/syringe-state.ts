import type { OrderStatus, SyringeReleaseResponse, SyringeState } from '@lockstep/shared';

// Which bedside actions an order allows, and its syringe state, are shared rules
// (bedsideActions, syringeState) the server enforces too; this is the screen's wording.

export function runningSyringe<T extends Pick<SyringeReleaseResponse, 'status'>>(releases: readonly T[]): T | undefined {
  return releases.find((release) => release.status === 'in_use');
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
