import type { Override } from '../orders/order.schema.js';
import { REGIMEN_FIELDS } from './regimen-fields.js';
import type { Finding, RegimenField } from './types.js';

/** An error or a hard limit: signing (and verifying) is refused while one stands. */
export function isBlockingFinding(finding: Finding): boolean {
  return finding.severity === 'error' || finding.severity === 'hard';
}

export function blockingFindings(findings: readonly Finding[]): Finding[] {
  return findings.filter(isBlockingFinding);
}

/** Whether any finding blocks signing: an error or a hard limit. */
export function hasBlockingFinding(findings: readonly Finding[]): boolean {
  return findings.some(isBlockingFinding);
}

/** Regimen fields outside a soft limit, each needing the prescriber's reason, in the order form's order. */
export function softFindingFields(findings: readonly Finding[]): RegimenField[] {
  const soft = new Set(findings.filter((finding) => finding.severity === 'soft').map((finding) => finding.field));
  return REGIMEN_FIELDS.filter((field) => soft.has(field));
}

/** Soft findings that no reason was given for: signing is refused until each has one. */
export function unexplainedSoftFindings(findings: readonly Finding[], overrides: readonly Pick<Override, 'field'>[]): Finding[] {
  return findings.filter((finding) => finding.severity === 'soft' && !overrides.some((override) => override.field === finding.field));
}

/** The reasons worth keeping with a signed order: those for a field that is outside a soft limit, trimmed. */
export function reasonsToKeep(findings: readonly Finding[], overrides: readonly Override[]): Override[] {
  const soft = new Set(findings.filter((finding) => finding.severity === 'soft').map((finding) => finding.field));
  return overrides.filter((override) => soft.has(override.field)).map(({ field, reason }) => ({ field, reason: reason.trim() }));
}
