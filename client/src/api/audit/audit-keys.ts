import type { AuditQuery } from '@lockstep/shared';

export const auditKeys = {
  all: ['audit'] as const,
  searches: () => [...auditKeys.all, 'search'] as const,
  search: (query: AuditQuery) => [...auditKeys.searches(), query] as const,
  orders: () => [...auditKeys.all, 'order'] as const,
  order: (orderId: number) => [...auditKeys.orders(), orderId] as const,
};
