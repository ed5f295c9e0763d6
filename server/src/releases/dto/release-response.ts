import type { SyringeReleaseResponse } from '@lockstep/shared';
import type { SyringeRelease } from '../entities/syringe-release.entity.js';

/** Expects `releasedBy` and `order` (for the dose unit) to be loaded. */
export function toReleaseResponse(release: SyringeRelease, doseUnit: 'mg' | 'mcg'): SyringeReleaseResponse {
  return {
    id: release.id,
    orderId: release.orderId,
    releaseCode: release.releaseCode,
    status: release.status,
    concentrationPerMl: release.concentrationPerMl,
    volumeMl: release.volumeMl,
    totalAmount: Number((release.concentrationPerMl * release.volumeMl).toPrecision(12)),
    doseUnit,
    batch: release.batch,
    expiresAt: release.expiresAt.toISOString(),
    preparedBy: release.preparedBy,
    checkedBy: release.checkedBy,
    overrideReason: release.overrideReason,
    releasedByName: release.releasedBy.displayName,
    releasedAt: release.releasedAt.toISOString(),
  };
}
