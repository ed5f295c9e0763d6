import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { patientSchema, type Patient } from '@lockstep/shared';
import { apiRequest } from '@/lib/api-client';
import { patientKeys, type PatientListFilters } from './patient-keys';

export function getPatients(filters: PatientListFilters, signal?: AbortSignal): Promise<Patient[]> {
  return apiRequest('/patients', {
    schema: patientSchema.array(),
    params: { wardId: filters.wardId },
    signal,
  });
}

export function patientsQueryOptions(filters: PatientListFilters) {
  return queryOptions({
    queryKey: patientKeys.list(filters),
    queryFn: ({ signal }) => getPatients(filters, signal),
  });
}

export function usePatients(filters: PatientListFilters) {
  // Keep the current rows on screen while another ward's list loads.
  return useQuery({ ...patientsQueryOptions(filters), placeholderData: keepPreviousData });
}
