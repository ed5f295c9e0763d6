import type { OrderStatus } from '@lockstep/shared';

/** What the bedside acts on: orders waiting for their first bedside check, and running ones. */
export const BEDSIDE_STATUSES: readonly OrderStatus[] = ['verified', 'active'];
