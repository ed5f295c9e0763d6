import { useMutation, useQueryClient } from '@tanstack/react-query';
import { patientSchema, type OpioidToleranceRequest, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { storePatient, type WithIdempotencyKey } from './store-patient';

export type UpdateOpioidToleranceVariables = WithIdempotencyKey & { patientId: number; tolerance: OpioidToleranceRequest };

/** Prescribers and pharmacists. 400 names `oralMorphineMgPerDay`, `days` or `opioidTolerant` when the claim and its basis disagree. */
export function updateOpioidTolerance({ patientId, tolerance, idempotencyKey }: UpdateOpioidToleranceVariables): Promise<Patient> {
  return apiRequest(`/patients/${patientId}/opioid-tolerance`, {
    method: 'PUT',
    body: tolerance,
    schema: patientSchema,
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useUpdateOpioidTolerance() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateOpioidTolerance, onSuccess: (patient) => storePatient(queryClient, patient) });
}
