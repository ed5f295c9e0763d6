import type { SyringeRelease } from './entities/syringe-release.entity.js';

/** What the audit trail keeps of a syringe release: its label, not who it was handed to. */
export function releaseAuditSummary(release: SyringeRelease): Record<string, unknown> {
  const { id, releaseCode, concentrationPerMl, volumeMl, batch, expiresAt, preparedBy, checkedBy, overrideReason } = release;
  return { releaseId: id, releaseCode, concentrationPerMl, volumeMl, batch, expiresAt, preparedBy, checkedBy, overrideReason };
}
