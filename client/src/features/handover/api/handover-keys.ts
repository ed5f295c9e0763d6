// One factory for every handover cache: the live stream and the sign-off mutation invalidate
// through it, so the board and the print sheet of a ward always refetch together.
export const handoverKeys = {
  all: ['handover'] as const,
  boards: () => [...handoverKeys.all, 'board'] as const,
  board: (wardId: number) => [...handoverKeys.boards(), wardId] as const,
};
