import type { OrderStatus } from '@lockstep/shared';

export interface BedsideOrderFilters {
  wardId?: number;
  patientId?: number;
  status: readonly OrderStatus[];
}

// Rooted under 'orders' on purpose: the orders feature invalidates ['orders'] after a decision or
// a release, and that reaches the bedside lists too. Bedside changes invalidate `orderCaches()` so
// the other order screens never show a status the bedside has just changed.
export const bedsideKeys = {
  orderCaches: () => ['orders'] as const,
  all: ['orders', 'bedside'] as const,
  lists: () => [...bedsideKeys.all, 'list'] as const,
  list: (filters: BedsideOrderFilters) => [...bedsideKeys.lists(), filters] as const,
  details: () => [...bedsideKeys.all, 'detail'] as const,
  detail: (orderId: number) => [...bedsideKeys.details(), orderId] as const,
  patient: (patientId: number) => [...bedsideKeys.all, 'patient', patientId] as const,
};
