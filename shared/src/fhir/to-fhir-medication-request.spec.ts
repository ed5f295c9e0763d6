import { describe, expect, it } from 'vitest';
import { type FhirOrderSource, toFhirMedicationRequest } from './to-fhir-medication-request.js';

// A worked example. Morphine 1 mg/mL, demand 1 mg, lockout 10 minutes: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]; 4-hour limit 30 mg: the typical ranges of a widely used clinical
// reference table [practice]. The loading dose, basal rate, 1-hour limit and clinician bolus
// are invented for the example: the mapping does not depend on their clinical values.
const WORKED_EXAMPLE: FhirOrderSource = {
  id: 12,
  version: 2,
  supersedesId: 11,
  status: 'active',
  regimenType: 'demand_basal',
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
  loadingDose: 2,
  demandDose: 1,
  lockoutMinutes: 10,
  basalRatePerHour: 0.5,
  oneHourLimit: 8,
  fourHourLimit: 30,
  clinicianBolusDose: 2,
  indication: 'Pain after laparotomy',
  reviewDate: '2030-01-02',
  prescriberId: 1,
  prescriberName: 'Amara Osei',
  signedAt: '2030-01-01T08:00:00.000Z',
  statusChangedAt: '2030-01-01T10:00:00.000Z',
  statusReason: null,
  startedAt: '2030-01-01T10:00:00.000Z',
};

const UCUM = 'http://unitsofmeasure.org';

// Expected values written out by hand. Element names and cardinalities: HL7 FHIR R4 (4.0.1),
// MedicationRequest, Medication and Dosage (Dosage.sequence: equal numbers run concurrently,
// higher ones follow; maxDosePerPeriod 0..1). Unit codes: UCUM ("ug", never "mcg").
// Identifier type MR: HL7 v2 table 0203 (R4 value set identifier-type).
describe('toFhirMedicationRequest: worked example', () => {
  it('maps the order to the expected MedicationRequest', () => {
    expect(toFhirMedicationRequest(WORKED_EXAMPLE)).toEqual({
      resourceType: 'MedicationRequest',
      id: '12',
      contained: [
        {
          resourceType: 'Medication',
          id: 'medication',
          code: { text: 'morphine' },
          ingredient: [
            {
              itemCodeableConcept: { text: 'morphine' },
              isActive: true,
              strength: {
                numerator: { value: 1, unit: 'mg', system: UCUM, code: 'mg' },
                denominator: { value: 1, unit: 'mL', system: UCUM, code: 'mL' },
              },
            },
          ],
        },
      ],
      identifier: [{ system: 'https://lockstep.example/fhir/sid/pca-order', value: '12' }],
      status: 'active',
      intent: 'order',
      category: [
        {
          coding: [{ system: 'http://terminology.hl7.org/CodeSystem/medicationrequest-category', code: 'inpatient', display: 'Inpatient' }],
        },
      ],
      medicationReference: { reference: '#medication', display: 'morphine 1 mg/mL' },
      subject: {
        type: 'Patient',
        identifier: {
          type: { coding: [{ system: 'http://terminology.hl7.org/CodeSystem/v2-0203', code: 'MR' }], text: 'MRN' },
          system: 'https://lockstep.example/fhir/sid/mrn',
          value: 'KB100231',
        },
        display: 'ACHTERBERG, Noah',
      },
      authoredOn: '2030-01-01T08:00:00.000Z',
      requester: {
        type: 'Practitioner',
        identifier: { system: 'https://lockstep.example/fhir/sid/user', value: '1' },
        display: 'Amara Osei',
      },
      reasonCode: [{ text: 'Pain after laparotomy' }],
      note: [{ text: 'Review by 2030-01-02' }],
      priorPrescription: { reference: 'MedicationRequest/11' },
      dosageInstruction: [
        {
          sequence: 1,
          text: 'Loading dose 2 mg intravenously, once, before the PCA starts',
          timing: { repeat: { count: 1 } },
          route: { text: 'Intravenous' },
          method: { text: 'Loading dose' },
          doseAndRate: [{ doseQuantity: { value: 2, unit: 'mg', system: UCUM, code: 'mg' } }],
        },
        {
          extension: [
            {
              url: 'https://lockstep.example/fhir/StructureDefinition/pca-lockout-interval',
              valueDuration: { value: 10, unit: 'min', system: UCUM, code: 'min' },
            },
          ],
          sequence: 2,
          text: 'Demand dose 1 mg intravenously when the patient presses the button; lockout 10 min',
          timing: { repeat: { frequency: 1, period: 10, periodUnit: 'min' } },
          asNeededBoolean: true,
          route: { text: 'Intravenous' },
          method: { text: 'Patient-controlled demand dose' },
          doseAndRate: [{ doseQuantity: { value: 1, unit: 'mg', system: UCUM, code: 'mg' } }],
        },
        {
          sequence: 2,
          text: 'Basal rate 0.5 mg/h intravenously, continuous',
          route: { text: 'Intravenous' },
          method: { text: 'Continuous infusion' },
          doseAndRate: [{ rateQuantity: { value: 0.5, unit: 'mg/h', system: UCUM, code: 'mg/h' } }],
        },
        {
          sequence: 2,
          text: '1-hour limit: at most 8 mg in any hour, demand doses and basal rate together',
          maxDosePerPeriod: {
            numerator: { value: 8, unit: 'mg', system: UCUM, code: 'mg' },
            denominator: { value: 1, unit: 'h', system: UCUM, code: 'h' },
          },
        },
        {
          sequence: 2,
          text: '4-hour limit: at most 30 mg in any 4 hours, demand doses and basal rate together',
          maxDosePerPeriod: {
            numerator: { value: 30, unit: 'mg', system: UCUM, code: 'mg' },
            denominator: { value: 4, unit: 'h', system: UCUM, code: 'h' },
          },
        },
        {
          sequence: 2,
          text: "Clinician bolus 2 mg intravenously as needed for breakthrough pain, given by a nurse with a second nurse's check",
          asNeededCodeableConcept: { text: 'Breakthrough pain' },
          route: { text: 'Intravenous' },
          method: { text: 'Clinician bolus' },
          doseAndRate: [{ doseQuantity: { value: 2, unit: 'mg', system: UCUM, code: 'mg' } }],
        },
      ],
    });
  });
});

describe('toFhirMedicationRequest: other orders', () => {
  // Fentanyl 10 mcg/mL, demand 10 mcg: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory].
  const fentanyl: FhirOrderSource = {
    ...WORKED_EXAMPLE,
    id: 3,
    supersedesId: null,
    status: 'returned',
    drugName: 'fentanyl',
    doseUnit: 'mcg',
    concentrationPerMl: 10,
    loadingDose: null,
    demandDose: 10,
    basalRatePerHour: 0,
    oneHourLimit: null,
    fourHourLimit: null,
    clinicianBolusDose: null,
    indication: '  ',
    statusReason: 'Please confirm the lockout',
    startedAt: null,
  };

  it('exchanges mcg as the UCUM code ug, shows mcg, and leaves out what the order has not got', () => {
    const resource = toFhirMedicationRequest(fentanyl);
    expect(resource.status).toBe('draft');
    expect(resource.statusReason).toEqual({ text: 'Please confirm the lockout' });
    expect(resource.medicationReference.display).toBe('fentanyl 10 mcg/mL');
    expect(resource.contained[0].ingredient[0].strength.numerator).toMatchObject({ value: 10, unit: 'mcg', code: 'ug' });
    expect(resource.dosageInstruction).toHaveLength(1);
    expect(resource.dosageInstruction[0]).toMatchObject({
      sequence: 1,
      asNeededBoolean: true,
      doseAndRate: [{ doseQuantity: { value: 10, unit: 'mcg', code: 'ug' } }],
    });
    expect(resource).not.toHaveProperty('priorPrescription');
    expect(resource).not.toHaveProperty('reasonCode');
  });

  it('gives the reason only when the order is not going ahead', () => {
    expect(toFhirMedicationRequest({ ...WORKED_EXAMPLE, statusReason: 'Matched at the bedside' })).not.toHaveProperty('statusReason');
    expect(toFhirMedicationRequest({ ...WORKED_EXAMPLE, status: 'discontinued', statusReason: 'Pain controlled' }).statusReason).toEqual({
      text: 'Pain controlled',
    });
  });

  it('names the rate of a mcg basal in ug/h', () => {
    const resource = toFhirMedicationRequest({ ...fentanyl, basalRatePerHour: 20 });
    expect(resource.dosageInstruction[1].doseAndRate).toEqual([{ rateQuantity: { value: 20, unit: 'mcg/h', system: UCUM, code: 'ug/h' } }]);
  });

  it('sends no empty array, object or string anywhere (FHIR JSON forbids them)', () => {
    const empties: string[] = [];
    const walk = (value: unknown, path: string): void => {
      if (value === '' || (Array.isArray(value) && value.length === 0)) empties.push(path);
      else if (value && typeof value === 'object') {
        if (!Array.isArray(value) && Object.keys(value).length === 0) empties.push(path);
        for (const [key, child] of Object.entries(value)) walk(child, `${path}.${key}`);
      }
    };
    walk(toFhirMedicationRequest(fentanyl), 'MedicationRequest');
    walk(toFhirMedicationRequest(WORKED_EXAMPLE), 'MedicationRequest');
    expect(empties).toEqual([]);
  });
});
