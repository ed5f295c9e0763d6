import type { OrderStatus } from '../orders/order-status.js';
import type { FhirMedicationRequestIntent, FhirMedicationRequestStatus } from './fhir-types.js';

/**
 * Every Lockstep order is signed by its prescriber with their password: an authorisation to give
 * the drug, which is FHIR's `order` intent, never a `proposal` or `plan`. Pharmacy verification
 * checks that order; it does not create a pharmacy's own (`filler-order`). So the intent is the
 * same in every status.
 */
export const FHIR_MEDICATION_REQUEST_INTENT: FhirMedicationRequestIntent = 'order';

/**
 * Lockstep status → R4 MedicationRequest.status. The quoted words are the definitions in R4's
 * medicationrequest-status code system.
 */
const STATUS: Record<Exclude<OrderStatus, 'superseded'>, FhirMedicationRequestStatus> = {
  // "not yet 'actionable', e.g. ... requires sign-off, verification": pharmacy has not verified it.
  awaiting_verification: 'draft',
  // "'actionable', but not all actions that are implied by it have occurred yet": verified, ready
  // for the bedside check (verified), or running (active).
  verified: 'active',
  active: 'active',
  // The pharmacist's query stops it before anyone gives it; it stays not actionable until the
  // prescriber revises it (a new MedicationRequest whose priorPrescription points here) or
  // cancels it. Not `on-hold`, which means a running course paused.
  returned: 'draft',
  // "withdrawn before any administrations have occurred": both happen only before the PCA starts.
  rejected: 'cancelled',
  cancelled: 'cancelled',
  // "permanently halted, before all of the administrations occurred": a PCA has no set number of
  // doses, so ending it is a stop, never `completed`.
  discontinued: 'stopped',
};

/**
 * A superseded order either never ran (a returned order replaced by its revision: `cancelled`) or
 * ran until the changed regimen replacing it started (`stopped`); `startedAt` tells which.
 */
export function fhirMedicationRequestStatus(status: OrderStatus, startedAt: string | null): FhirMedicationRequestStatus {
  if (status === 'superseded') return startedAt ? 'stopped' : 'cancelled';
  return STATUS[status];
}
