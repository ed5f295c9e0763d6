import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type AddAllergyRequest, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type AddAllergyVariables = WithIdempotencyKey & { patientId: number; allergy: AddAllergyRequest };

/** Prescribers and pharmacists. 400 names `drugId`, `substance`, `reaction` or `severity`; a substance already recorded is refused on `substance`. */
export function addAllergy({ patientId, allergy, idempotencyKey }: AddAllergyVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/allergies`, {
    method: 'POST',
    body: allergy,
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useAddAllergy() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addAllergy, onSuccess: (patient) => storePatient(queryClient, patient) });
}
