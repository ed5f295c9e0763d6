import type { Finding, OrderCheckContext, PatientAllergy } from './types.js';

/**
 * Findings for ordering a drug the patient is recorded as allergic to: anaphylaxis blocks,
 * any other recorded reaction needs a reason.
 */
export function allergyFindings(_drug: OrderCheckContext['drug'], _allergies: readonly PatientAllergy[] | undefined): Finding[] {
  return [];
}
