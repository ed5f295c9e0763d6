import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type RemoveAllergyVariables = WithIdempotencyKey & { patientId: number; allergyId: number };

/** Prescribers and pharmacists: an entry recorded in error. The audit trail keeps what it said. */
export function removeAllergy({ patientId, allergyId, idempotencyKey }: RemoveAllergyVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/allergies/${allergyId}`, {
    method: 'DELETE',
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useRemoveAllergy() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: removeAllergy, onSuccess: (patient) => storePatient(queryClient, patient) });
}
