export const libraryKeys = {
  all: ['library'] as const,
  actives: () => [...libraryKeys.all, 'active'] as const,
  active: (wardId: number) => [...libraryKeys.actives(), wardId] as const,
  versionLists: () => [...libraryKeys.all, 'versions'] as const,
  versionList: (wardId: number) => [...libraryKeys.versionLists(), wardId] as const,
  versionDetails: () => [...libraryKeys.all, 'version'] as const,
  versionDetail: (id: number) => [...libraryKeys.versionDetails(), id] as const,
  diffs: () => [...libraryKeys.all, 'diff'] as const,
  diff: (id: number) => [...libraryKeys.diffs(), id] as const,
  affectedOrderLists: () => [...libraryKeys.all, 'affected-orders'] as const,
  affectedOrders: (id: number) => [...libraryKeys.affectedOrderLists(), id] as const,
};
