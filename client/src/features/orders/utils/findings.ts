import type { Finding, FindingSeverity } from '@lockstep/shared';

// Which findings block signing and which need a reason are shared rules (isBlockingFinding,
// blockingFindings, softFindingFields); these only arrange findings for the screen.

/** The findings on one field, worst first as `checkOrder` sorts them. */
export function findingsFor(findings: readonly Finding[], field: string): Finding[] {
  return findings.filter((finding) => finding.field === field);
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
