import type { FhirBundle } from './fhir-types.js';
import { type FhirOrderSource, toFhirMedicationRequest } from './to-fhir-medication-request.js';

export type FhirBundleContext = {
  /** Absolute base of Lockstep's FHIR routes, e.g. `https://lockstep.hospital.example/api/fhir`. */
  baseUrl: string;
  /** When the bundle was put together (ISO 8601). */
  timestamp: string;
};

/**
 * A patient's PCA orders as an R4 Bundle of type `collection`: a set of resources handed over
 * together, not the answer to a FHIR search (so no `total`, which R4 allows only on searchset and
 * history bundles). With no orders, `entry` is left out: FHIR JSON has no empty arrays.
 */
export function toFhirPcaBundle(orders: readonly FhirOrderSource[], context: FhirBundleContext): FhirBundle {
  const bundle: FhirBundle = { resourceType: 'Bundle', type: 'collection', timestamp: context.timestamp };
  if (orders.length === 0) return bundle;
  const base = context.baseUrl.replace(/\/+$/, '');
  return {
    ...bundle,
    entry: orders.map((order) => {
      const resource = toFhirMedicationRequest(order);
      return { fullUrl: `${base}/MedicationRequest/${resource.id}`, resource };
    }),
  };
}
