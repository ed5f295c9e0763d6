import { ConflictException } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { reconcile, type ReconciliationResponse } from '@lockstep/shared';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { ReleaseReconciliation } from './entities/release-reconciliation.entity.js';

/**
 * Finishes the running syringe: what was dispensed against what the pump infused plus what was
 * wasted in front of a witness. Over the ward's tolerance, the discrepancy must be reported.
 */
export async function finishRunningSyringe(
  manager: EntityManager,
  orderId: number,
  volumes: { infusedMl: number; wastedMl: number },
  people: { recordedById: number; witnessId: number },
  toleranceMl: number,
): Promise<ReconciliationResponse & { releaseCode: string }> {
  const release = await manager.findOneBy(SyringeRelease, { orderId, status: 'in_use' });
  if (!release) throw new ConflictException('No syringe is running for this order');
  const finished = await manager.update(
    SyringeRelease,
    { id: release.id, status: 'in_use', rowVersion: release.rowVersion },
    { status: 'finished', rowVersion: release.rowVersion + 1 },
  );
  if (finished.affected !== 1) throw new ConflictException('This syringe was finished by someone else a moment ago');

  const result = reconcile(release.volumeMl, volumes.infusedMl, volumes.wastedMl, toleranceMl);
  await manager.insert(ReleaseReconciliation, {
    releaseId: release.id,
    dispensedMl: release.volumeMl,
    infusedMl: volumes.infusedMl,
    wastedMl: volumes.wastedMl,
    discrepancyMl: result.discrepancyMl,
    mustReport: result.mustReport,
    toleranceMl,
    recordedById: people.recordedById,
    witnessId: people.witnessId,
    at: new Date(),
  });
  return {
    ...result,
    dispensedMl: release.volumeMl,
    infusedMl: volumes.infusedMl,
    wastedMl: volumes.wastedMl,
    releaseCode: release.releaseCode,
  };
}
