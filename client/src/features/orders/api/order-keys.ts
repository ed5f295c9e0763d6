import type { OrderFields, OrderStatus } from '@lockstep/shared';

export interface OrderListFilters {
  wardId?: number;
  status?: readonly OrderStatus[];
  mine?: boolean;
  patientId?: number;
}

// Verification, release and the label read the same order cache, so they live in this one
// feature: a decision or a release invalidates through this factory and every screen follows.
export const orderKeys = {
  all: ['orders'] as const,
  lists: () => [...orderKeys.all, 'list'] as const,
  list: (filters: OrderListFilters) => [...orderKeys.lists(), filters] as const,
  details: () => [...orderKeys.all, 'detail'] as const,
  detail: (id: number) => [...orderKeys.details(), id] as const,
  previews: () => [...orderKeys.all, 'preview'] as const,
  preview: (fields: OrderFields) => [...orderKeys.previews(), fields] as const,
};
