import { queryOptions, useQuery } from '@tanstack/react-query';
import { patientSchema, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { patientKeys } from './patient-keys';

export function getPatient(id: number, signal?: AbortSignal): Promise<Patient> {
  return apiRequest(`/patients/${id}`, { schema: patientSchema, signal });
}

export function patientQueryOptions(id: number) {
  return queryOptions({
    queryKey: patientKeys.detail(id),
    queryFn: ({ signal }) => getPatient(id, signal),
  });
}

/** `null` waits (e.g. for the order that names the patient). */
export function usePatient(id: number | null) {
  return useQuery({ ...patientQueryOptions(id ?? 0), enabled: id !== null });
}
