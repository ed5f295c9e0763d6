import type { QueryClient } from '@tanstack/react-query';
import type { Patient } from '@lockstep/shared';
import { auditKeys } from '@/api/audit/audit-keys';
import { orderKeys } from '@/api/orders/order-keys';
import { patientKeys } from './patient-keys';

/**
 * After a change to the patient record: the answer is the patient as now recorded; lists, the
 * audit trail and any order check (allergies, tolerance and weight change its findings) refresh.
 */
export function storePatient(queryClient: QueryClient, patient: Patient): void {
  queryClient.setQueryData(patientKeys.detail(patient.id), patient);
  void queryClient.invalidateQueries({ queryKey: patientKeys.lists() });
  void queryClient.invalidateQueries({ queryKey: orderKeys.previews() });
  void queryClient.invalidateQueries({ queryKey: auditKeys.all });
}

/** One key per change, sent as `Idempotency-Key` like every other write. */
export type WithIdempotencyKey = { idempotencyKey: string };
