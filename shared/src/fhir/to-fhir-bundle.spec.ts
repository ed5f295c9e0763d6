import { describe, expect, it } from 'vitest';
import { toFhirPcaBundle } from './to-fhir-bundle.js';
import { type FhirOrderSource, toFhirMedicationRequest } from './to-fhir-medication-request.js';

// Morphine 1 mg/mL, demand 1 mg, lockout 10 minutes: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory].
const ORDER: FhirOrderSource = {
  id: 12,
  version: 2,
  supersedesId: 11,
  status: 'active',
  regimenType: 'demand_only',
  patientId: 1,
  patientName: 'ACHTERBERG, Noah',
  patientMrn: 'KB100231',
  wardId: 1,
  wardName: 'Harbour',
  bed: 'H02',
  drugId: 1,
  drugName: 'morphine',
  doseUnit: 'mg',
  concentrationPerMl: 1,
  loadingDose: null,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0,
  oneHourLimit: null,
  fourHourLimit: null,
  clinicianBolusDose: null,
  indication: '',
  reviewDate: '2030-01-02',
  prescriberId: 1,
  prescriberName: 'Amara Osei',
  signedAt: '2030-01-01T08:00:00.000Z',
  statusChangedAt: '2030-01-01T10:00:00.000Z',
  statusReason: null,
  startedAt: '2030-01-01T10:00:00.000Z',
};

// Source: HL7 FHIR R4 (4.0.1), Bundle: type `collection`; `total` only for searchset and history
// (invariant bdl-1); entry.fullUrl an absolute URL.
describe('toFhirPcaBundle', () => {
  const context = { baseUrl: 'https://lockstep.hospital.example/api/fhir/', timestamp: '2030-01-01T12:00:00.000Z' };

  it('collects each order with its absolute URL', () => {
    const earlier: FhirOrderSource = { ...ORDER, id: 11, supersedesId: null, status: 'superseded' };
    expect(toFhirPcaBundle([earlier, ORDER], context)).toEqual({
      resourceType: 'Bundle',
      type: 'collection',
      timestamp: '2030-01-01T12:00:00.000Z',
      entry: [
        { fullUrl: 'https://lockstep.hospital.example/api/fhir/MedicationRequest/11', resource: toFhirMedicationRequest(earlier) },
        { fullUrl: 'https://lockstep.hospital.example/api/fhir/MedicationRequest/12', resource: toFhirMedicationRequest(ORDER) },
      ],
    });
  });

  it('leaves entry out for a patient without PCA orders', () => {
    expect(toFhirPcaBundle([], context)).toEqual({ resourceType: 'Bundle', type: 'collection', timestamp: '2030-01-01T12:00:00.000Z' });
  });
});
