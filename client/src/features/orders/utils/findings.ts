import type { Finding, FindingSeverity, RegimenField } from '@lockstep/shared';
import { REGIMEN_FIELDS } from '@lockstep/shared';

/** Errors and hard-limit findings block signing (and verifying). */
export function isBlocking(finding: Finding): boolean {
  return finding.severity === 'error' || finding.severity === 'hard';
}

export function blockingFindings(findings: readonly Finding[]): Finding[] {
  return findings.filter(isBlocking);
}

/** The findings on one field, worst first as `checkOrder` sorts them. */
export function findingsFor(findings: readonly Finding[], field: string): Finding[] {
  return findings.filter((finding) => finding.field === field);
}

/** Fields outside a soft limit, each needing a reason to sign, in the form's order. */
export function softFields(findings: readonly Finding[]): RegimenField[] {
  const soft = new Set(findings.filter((finding) => finding.severity === 'soft').map((finding) => finding.field));
  return REGIMEN_FIELDS.filter((field) => soft.has(field));
}

function findingKey(finding: Finding): string {
  return `${finding.field}|${finding.severity}|${finding.code}`;
}

/** Whether two checks found the same things (messages aside: wording may differ, meaning not). */
export function sameFindings(a: readonly Finding[], b: readonly Finding[]): boolean {
  if (a.length !== b.length) return false;
  const left = a.map(findingKey).sort();
  const right = b.map(findingKey).sort();
  return left.every((key, index) => key === right[index]);
}

export function countBySeverity(findings: readonly Finding[]): Record<FindingSeverity, number> {
  const counts: Record<FindingSeverity, number> = { error: 0, hard: 0, soft: 0, caution: 0 };
  for (const finding of findings) counts[finding.severity] += 1;
  return counts;
}
