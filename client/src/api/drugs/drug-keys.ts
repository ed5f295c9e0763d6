export const drugKeys = {
  all: ['drugs'] as const,
  lists: () => [...drugKeys.all, 'list'] as const,
};
