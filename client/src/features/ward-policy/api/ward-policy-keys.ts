export const wardPolicyKeys = {
  all: ['ward-policy'] as const,
  details: () => [...wardPolicyKeys.all, 'detail'] as const,
  detail: (wardId: number) => [...wardPolicyKeys.details(), wardId] as const,
};
