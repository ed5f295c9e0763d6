import type { AuditQuery } from '@lockstep/shared';

export const auditKeys = {
  all: ['audit'] as const,
  searches: () => [...auditKeys.all, 'search'] as const,
  search: (query: AuditQuery) => [...auditKeys.searches(), query] as const,
};
