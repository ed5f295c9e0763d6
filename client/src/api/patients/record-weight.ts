import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type Patient, type RecordWeightRequest } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type RecordWeightVariables = WithIdempotencyKey & { patientId: number; weight: RecordWeightRequest };

/** Nurses and prescribers. 400 names `weightKg` or `measuredOn` (not in the future, not before birth). */
export function recordWeight({ patientId, weight, idempotencyKey }: RecordWeightVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/weights`, {
    method: 'POST',
    body: weight,
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useRecordWeight() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: recordWeight, onSuccess: (patient) => storePatient(queryClient, patient) });
}
