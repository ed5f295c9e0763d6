import { describe, expect, it } from 'vitest';
import { ORDER_STATUSES } from '../orders/order-status.js';
import { FHIR_MEDICATION_REQUEST_INTENT, fhirMedicationRequestStatus } from './order-status-to-fhir.js';

// Source: HL7 FHIR R4 (4.0.1), MedicationRequest, code systems medicationrequest-status and
// medicationrequest-intent (the codes and their definitions).
const R4_STATUSES = ['active', 'on-hold', 'cancelled', 'completed', 'entered-in-error', 'stopped', 'draft', 'unknown'];
const R4_INTENTS = ['proposal', 'plan', 'order', 'original-order', 'reflex-order', 'filler-order', 'instance-order', 'option'];

describe('Lockstep order status → FHIR MedicationRequest status and intent', () => {
  it('maps every Lockstep status to an R4 code', () => {
    for (const status of ORDER_STATUSES) {
      expect(R4_STATUSES, status).toContain(fhirMedicationRequestStatus(status, null));
      expect(R4_STATUSES, status).toContain(fhirMedicationRequestStatus(status, '2030-01-01T10:00:00.000Z'));
    }
    expect(R4_INTENTS).toContain(FHIR_MEDICATION_REQUEST_INTENT);
  });

  it('gives each status the code whose R4 definition fits', () => {
    const started = '2030-01-01T10:00:00.000Z';
    expect(fhirMedicationRequestStatus('awaiting_verification', null)).toBe('draft'); // "requires ... verification"
    expect(fhirMedicationRequestStatus('returned', null)).toBe('draft');
    expect(fhirMedicationRequestStatus('verified', null)).toBe('active');
    expect(fhirMedicationRequestStatus('active', started)).toBe('active');
    expect(fhirMedicationRequestStatus('rejected', null)).toBe('cancelled'); // "withdrawn before any administrations"
    expect(fhirMedicationRequestStatus('cancelled', null)).toBe('cancelled');
    expect(fhirMedicationRequestStatus('discontinued', started)).toBe('stopped'); // "permanently halted"
  });

  it('tells a superseded order that never ran from one that ran', () => {
    expect(fhirMedicationRequestStatus('superseded', null)).toBe('cancelled');
    expect(fhirMedicationRequestStatus('superseded', '2030-01-01T10:00:00.000Z')).toBe('stopped');
  });

  it('is always an order: the prescriber signed it', () => {
    expect(FHIR_MEDICATION_REQUEST_INTENT).toBe('order');
  });
});
