import type { EntityManager } from 'typeorm';
import { normaliseReleaseCode } from '@lockstep/shared';
import { fieldError } from '../common/errors/field-error.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';

/** A `ready` syringe released for this very order, from the code on its label; a 400 on `field` otherwise. */
export async function readyRelease(manager: EntityManager, order: PcaOrder, typedCode: string, field: string): Promise<SyringeRelease> {
  const release = await manager.findOneBy(SyringeRelease, { releaseCode: normaliseReleaseCode(typedCode) });
  if (!release) throw fieldError(field, 'No syringe has this release code: check the label');
  if (release.orderId !== order.id) throw fieldError(field, 'This syringe was released for another order: do not use it');
  if (release.status !== 'ready') {
    throw fieldError(field, `This syringe is ${release.status === 'in_use' ? 'already in use' : 'finished'}: use a new, ready syringe`);
  }
  return release;
}
