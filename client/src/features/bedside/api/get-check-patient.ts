import { queryOptions, useQuery } from '@tanstack/react-query';
import { patientSchema, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { bedsideKeys } from './bedside-keys';

/**
 * The order's patient, for comparing the wristband as soon as it is typed. Never shown on the
 * check: the identifiers must come from the wristband, not from the screen.
 */
export function getCheckPatient(patientId: number, signal?: AbortSignal): Promise<Patient> {
  return apiRequest(`/patients/${patientId}`, { schema: patientSchema, signal });
}

export function checkPatientQueryOptions(patientId: number) {
  return queryOptions({
    queryKey: bedsideKeys.patient(patientId),
    queryFn: ({ signal }) => getCheckPatient(patientId, signal),
  });
}

export function useCheckPatient(patientId: number | undefined) {
  return useQuery({ ...checkPatientQueryOptions(patientId ?? 0), enabled: patientId !== undefined });
}
