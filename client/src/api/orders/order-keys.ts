import type { OrderFields, OrderStatus } from '@lockstep/shared';

export interface OrderListFilters {
  wardId?: number;
  /** Several wards at once (a nurse's own), sent as `wardIds=1,4`. */
  wardIds?: readonly number[];
  status?: readonly OrderStatus[];
  mine?: boolean;
  patientId?: number;
}

// Every screen that shows an order (orders, verification, release, bedside, the PCA page, its
// story) reads it from this one tree. An order's observations, usage and audit sit under its
// detail, so invalidating `detail(id)` refreshes everything about it; `exact: true` refreshes the
// order alone.
export const orderKeys = {
  all: ['orders'] as const,
  lists: () => [...orderKeys.all, 'list'] as const,
  list: (filters: OrderListFilters) => [...orderKeys.lists(), filters] as const,
  details: () => [...orderKeys.all, 'detail'] as const,
  detail: (id: number) => [...orderKeys.details(), id] as const,
  observations: (id: number) => [...orderKeys.detail(id), 'observations'] as const,
  usages: (id: number) => [...orderKeys.detail(id), 'usage'] as const,
  usage: (id: number, hours: number) => [...orderKeys.usages(id), hours] as const,
  audit: (id: number) => [...orderKeys.detail(id), 'audit'] as const,
  previews: () => [...orderKeys.all, 'preview'] as const,
  preview: (fields: OrderFields) => [...orderKeys.previews(), fields] as const,
};
