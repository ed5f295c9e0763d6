/**
 * Query keys of the PCA page. Everything about one order sits under `order(id)`, so a new
 * observation or an acknowledged flag refreshes the order, its observations and its usage at once.
 */
export const pcaKeys = {
  all: ['pca'] as const,
  orders: () => [...pcaKeys.all, 'order'] as const,
  order: (orderId: number) => [...pcaKeys.orders(), orderId] as const,
  detail: (orderId: number) => [...pcaKeys.order(orderId), 'detail'] as const,
  observations: (orderId: number) => [...pcaKeys.order(orderId), 'observations'] as const,
  usages: (orderId: number) => [...pcaKeys.order(orderId), 'usage'] as const,
  usage: (orderId: number, hours: number) => [...pcaKeys.usages(orderId), hours] as const,
  patientOrders: (patientId: number) => [...pcaKeys.all, 'patient', patientId] as const,
};
