/**
 * The slice of HL7 FHIR R4 (4.0.1) data types and resources that Lockstep exports. Optional
 * elements are left out rather than sent empty: FHIR JSON forbids empty arrays, objects and strings.
 */

export type FhirQuantity = { value: number; unit: string; system: string; code: string };
export type FhirRatio = { numerator: FhirQuantity; denominator: FhirQuantity };
export type FhirCoding = { system: string; code: string; display?: string };
export type FhirCodeableConcept = { coding?: FhirCoding[]; text?: string };
export type FhirIdentifier = { type?: FhirCodeableConcept; system: string; value: string };
export type FhirReference = { reference?: string; type?: string; identifier?: FhirIdentifier; display?: string };
export type FhirExtension = { url: string; valueDuration?: FhirQuantity };

/** R4 units-of-time value set. */
export type FhirUnitOfTime = 's' | 'min' | 'h' | 'd' | 'wk' | 'mo' | 'a';

export type FhirTiming = {
  repeat: { count?: number; frequency?: number; period?: number; periodUnit?: FhirUnitOfTime };
};

export type FhirDosage = {
  extension?: FhirExtension[];
  sequence?: number;
  text?: string;
  timing?: FhirTiming;
  asNeededBoolean?: boolean;
  asNeededCodeableConcept?: FhirCodeableConcept;
  route?: FhirCodeableConcept;
  method?: FhirCodeableConcept;
  doseAndRate?: { doseQuantity?: FhirQuantity; rateQuantity?: FhirQuantity }[];
  maxDosePerPeriod?: FhirRatio;
};

export type FhirMedication = {
  resourceType: 'Medication';
  id: string;
  code: FhirCodeableConcept;
  ingredient: { itemCodeableConcept: FhirCodeableConcept; isActive: boolean; strength: FhirRatio }[];
};

/** R4 medicationrequest-status. */
export type FhirMedicationRequestStatus =
  'active' | 'on-hold' | 'cancelled' | 'completed' | 'entered-in-error' | 'stopped' | 'draft' | 'unknown';
/** R4 medicationrequest-intent. */
export type FhirMedicationRequestIntent =
  'proposal' | 'plan' | 'order' | 'original-order' | 'reflex-order' | 'filler-order' | 'instance-order' | 'option';

export type FhirMedicationRequest = {
  resourceType: 'MedicationRequest';
  id: string;
  contained: FhirMedication[];
  identifier: FhirIdentifier[];
  status: FhirMedicationRequestStatus;
  statusReason?: FhirCodeableConcept;
  intent: FhirMedicationRequestIntent;
  category: FhirCodeableConcept[];
  medicationReference: FhirReference;
  subject: FhirReference;
  authoredOn: string;
  requester: FhirReference;
  reasonCode?: FhirCodeableConcept[];
  note?: { text: string }[];
  dosageInstruction: FhirDosage[];
  priorPrescription?: FhirReference;
};

export type FhirBundle = {
  resourceType: 'Bundle';
  type: 'collection';
  timestamp: string;
  entry?: { fullUrl: string; resource: FhirMedicationRequest }[];
};

/** R4 issue-type codes Lockstep answers with. */
export type FhirIssueType = 'invalid' | 'login' | 'forbidden' | 'not-found' | 'conflict' | 'throttled' | 'processing' | 'exception';

export type FhirOperationOutcome = {
  resourceType: 'OperationOutcome';
  issue: { severity: 'error'; code: FhirIssueType; diagnostics: string }[];
};
