import { formatDose } from '../dose/format-dose.js';
import type { OrderSummary } from '../orders/order.schema.js';
import type { FhirMedication, FhirMedicationRequest } from './fhir-types.js';
import {
  IDENTIFIER_TYPE_SYSTEM,
  MEDICATION_REQUEST_CATEGORY_SYSTEM,
  MRN_IDENTIFIER_SYSTEM,
  PCA_ORDER_IDENTIFIER_SYSTEM,
  USER_IDENTIFIER_SYSTEM,
} from './fhir-systems.js';
import { FHIR_MEDICATION_REQUEST_INTENT, fhirMedicationRequestStatus } from './order-status-to-fhir.js';
import { pcaDosageInstructions } from './pca-dosage.js';
import { concentrationRatio } from './ucum-quantity.js';

/** What the export reads from an order: its summary and when it started (an OrderDetail fits). */
export type FhirOrderSource = OrderSummary & { startedAt: string | null };

const MEDICATION_ID = 'medication';

/**
 * One PCA order as an HL7 FHIR R4 MedicationRequest. The drug and its concentration travel as a
 * contained Medication (R4 puts strength on Medication.ingredient), named in text only: no drug
 * code we could get wrong. Patient and prescriber are logical references by identifier, because
 * Lockstep serves no Patient or Practitioner resources.
 */
export function toFhirMedicationRequest(order: FhirOrderSource): FhirMedicationRequest {
  const id = String(order.id);
  const concentration = `${formatDose(order.concentrationPerMl, order.doseUnit)}/mL`;
  const status = fhirMedicationRequestStatus(order.status, order.startedAt);
  return {
    resourceType: 'MedicationRequest',
    id,
    contained: [containedMedication(order)],
    identifier: [{ system: PCA_ORDER_IDENTIFIER_SYSTEM, value: id }],
    status,
    // Why it is not, or no longer, going ahead; the note recorded when a PCA starts is not a reason.
    ...(order.statusReason && status !== 'active' ? { statusReason: { text: order.statusReason } } : {}),
    intent: FHIR_MEDICATION_REQUEST_INTENT,
    category: [{ coding: [{ system: MEDICATION_REQUEST_CATEGORY_SYSTEM, code: 'inpatient', display: 'Inpatient' }] }],
    medicationReference: { reference: `#${MEDICATION_ID}`, display: `${order.drugName} ${concentration}` },
    subject: {
      type: 'Patient',
      identifier: {
        type: { coding: [{ system: IDENTIFIER_TYPE_SYSTEM, code: 'MR' }], text: 'MRN' },
        system: MRN_IDENTIFIER_SYSTEM,
        value: order.patientMrn,
      },
      display: order.patientName,
    },
    authoredOn: order.signedAt,
    requester: {
      type: 'Practitioner',
      identifier: { system: USER_IDENTIFIER_SYSTEM, value: String(order.prescriberId) },
      display: order.prescriberName,
    },
    ...(order.indication.trim() ? { reasonCode: [{ text: order.indication.trim() }] } : {}),
    note: [{ text: `Review by ${order.reviewDate}` }],
    dosageInstruction: pcaDosageInstructions(order),
    // A revision (a changed regimen is a new order version: docs/design.md, "Order lifecycle") points
    // at the order it replaces.
    ...(order.supersedesId !== null ? { priorPrescription: { reference: `MedicationRequest/${order.supersedesId}` } } : {}),
  };
}

function containedMedication(order: FhirOrderSource): FhirMedication {
  const drug = { text: order.drugName };
  return {
    resourceType: 'Medication',
    id: MEDICATION_ID,
    code: drug,
    ingredient: [{ itemCodeableConcept: drug, isActive: true, strength: concentrationRatio(order.concentrationPerMl, order.doseUnit) }],
  };
}
