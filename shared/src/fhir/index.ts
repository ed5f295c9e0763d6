// The FHIR export's public surface: one line in shared/src/index.ts.
export * from './fhir-types.js';
export * from './fhir-systems.js';
export * from './ucum-quantity.js';
export * from './order-status-to-fhir.js';
export * from './pca-dosage.js';
export * from './to-fhir-medication-request.js';
export * from './to-fhir-bundle.js';
export * from './operation-outcome.js';
