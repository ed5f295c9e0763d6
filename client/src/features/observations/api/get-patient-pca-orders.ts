import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { pcaOrderSummarySchema, type PcaOrderSummary } from './pca-schemas';

/** A patient's running PCAs (status active). */
export function getPatientPcaOrders(patientId: number, signal?: AbortSignal): Promise<PcaOrderSummary[]> {
  return apiRequest('/orders', { schema: pcaOrderSummarySchema.array(), params: { patientId, status: 'active' }, signal });
}

export function patientPcaOrdersQueryOptions(patientId: number) {
  return queryOptions({
    queryKey: pcaKeys.patientOrders(patientId),
    queryFn: ({ signal }) => getPatientPcaOrders(patientId, signal),
    staleTime: 0,
  });
}

export function usePatientPcaOrders(patientId: number) {
  return useQuery(patientPcaOrdersQueryOptions(patientId));
}
