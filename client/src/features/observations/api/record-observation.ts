import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SedationLevel } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { pcaKeys } from './pca-keys';
import { recordedObservationSchema, type RecordedObservation } from './pca-schemas';

export type CreateObservationRequest = {
  /** ISO time; left out for "now". */
  at?: string;
  painScore: number;
  sedationLevel: SedationLevel;
  respiratoryRate: number;
  spo2: number;
  attempts: number;
  delivered: number;
  volumeInfusedMl: number;
  syringeRemainingMl: number;
  note?: string;
};

export interface RecordObservationVariables {
  orderId: number;
  observation: CreateObservationRequest;
}

/** 400 names the fields (pump totals never go down within one syringe); 409 when the PCA is not running. */
export function recordObservation({ orderId, observation }: RecordObservationVariables): Promise<RecordedObservation> {
  return apiRequest(`/orders/${orderId}/observations`, { method: 'POST', body: observation, schema: recordedObservationSchema });
}

export function useRecordObservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordObservation,
    // The order's flags, observations, charts and "next due" all change.
    onSuccess: (_observation, { orderId }) => queryClient.invalidateQueries({ queryKey: pcaKeys.order(orderId) }),
  });
}
