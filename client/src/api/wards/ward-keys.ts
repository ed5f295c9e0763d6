// One tree for the wards and each ward's policy: the policy screen and the observation form's
// breathing thresholds read the same cache, so saving a policy updates both.
export const wardKeys = {
  all: ['wards'] as const,
  lists: () => [...wardKeys.all, 'list'] as const,
  details: () => [...wardKeys.all, 'detail'] as const,
  detail: (wardId: number) => [...wardKeys.details(), wardId] as const,
  policy: (wardId: number) => [...wardKeys.detail(wardId), 'policy'] as const,
};
