/**
 * URLs Lockstep's FHIR export uses. Identifier systems and the extension live under a namespace of
 * our own; `lockstep.example` is a reserved example domain (RFC 2606), so a deployment that needs
 * its own namespace changes LOCKSTEP_FHIR_NAMESPACE (docs/integration.md lists every URL).
 */
export const LOCKSTEP_FHIR_NAMESPACE = 'https://lockstep.example/fhir';

export const PCA_ORDER_IDENTIFIER_SYSTEM = `${LOCKSTEP_FHIR_NAMESPACE}/sid/pca-order`;
export const MRN_IDENTIFIER_SYSTEM = `${LOCKSTEP_FHIR_NAMESPACE}/sid/mrn`;
export const USER_IDENTIFIER_SYSTEM = `${LOCKSTEP_FHIR_NAMESPACE}/sid/user`;

/** FHIR has no lockout element (R4 Dosage): the lockout interval travels in this extension, a Duration. */
export const PCA_LOCKOUT_EXTENSION_URL = `${LOCKSTEP_FHIR_NAMESPACE}/StructureDefinition/pca-lockout-interval`;

// Published systems, each value as the FHIR R4 specification and its value sets give it.
export const UCUM_SYSTEM = 'http://unitsofmeasure.org';
export const IDENTIFIER_TYPE_SYSTEM = 'http://terminology.hl7.org/CodeSystem/v2-0203';
export const MEDICATION_REQUEST_CATEGORY_SYSTEM = 'http://terminology.hl7.org/CodeSystem/medicationrequest-category';

/** The FHIR JSON media type (R4 http.html, "Content Types and encodings"). */
export const FHIR_JSON_MEDIA_TYPE = 'application/fhir+json';
