// Pharmacy's equianalgesic table. The usage page gets the factors it used inside its own answer,
// so it refreshes through the orders keys; saving a factor invalidates those too.
export const equianalgesicKeys = {
  all: ['equianalgesic-factors'] as const,
  list: () => [...equianalgesicKeys.all, 'list'] as const,
};
