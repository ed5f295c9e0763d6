import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type Patient, type Spo2ScaleRequest } from '@lockstep/shared';
import { orderKeys } from '@/api/orders/order-keys';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type UpdateSpo2ScaleVariables = WithIdempotencyKey & { patientId: number } & Spo2ScaleRequest;

/** Prescribers only. The same scale again changes and records nothing; 400 names `spo2Scale`. */
export function updateSpo2Scale({ patientId, spo2Scale, idempotencyKey }: UpdateSpo2ScaleVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/spo2-scale`, {
    method: 'PUT',
    body: { spo2Scale } satisfies Spo2ScaleRequest,
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useUpdateSpo2Scale() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSpo2Scale,
    onSuccess: (patient) => {
      storePatient(queryClient, patient);
      // The PCA pages score NEWS2 and word the SpO2 flags by the patient's scale.
      void queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}
