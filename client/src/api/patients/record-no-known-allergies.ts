import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type RecordNoKnownAllergiesVariables = WithIdempotencyKey & { patientId: number };

/** Prescribers and pharmacists; 409 while the patient has allergy entries. */
export function recordNoKnownAllergies({ patientId, idempotencyKey }: RecordNoKnownAllergiesVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/no-known-allergies`, {
    method: 'POST',
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useRecordNoKnownAllergies() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: recordNoKnownAllergies, onSuccess: (patient) => storePatient(queryClient, patient) });
}
