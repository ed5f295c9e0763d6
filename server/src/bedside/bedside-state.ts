import { ConflictException } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { bedsideActionAllowed, syringeState, type BedsideAction } from '@lockstep/shared';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';

const WHY_NOT: Record<BedsideAction, string> = {
  check: 'A syringe is still running for this order: record the syringe change (old syringe and witnessed waste) first',
  observe: 'No syringe is running: finish the bedside check first',
  bolus: 'No syringe is running: finish the bedside check first',
  'syringe-change': 'No syringe is running for this order',
  discontinue: 'No syringe is running for this order',
};

/**
 * Refuses (409) a bedside action that the order's status and syringes do not allow now, by the
 * same shared rule the client offers its buttons by. Callers check the status first, for their
 * own wording; this names what is wrong with the syringes.
 */
export async function requireBedsideAction(manager: EntityManager, order: PcaOrder, action: BedsideAction): Promise<void> {
  const releases = await manager.find(SyringeRelease, { select: { id: true, status: true }, where: { orderId: order.id } });
  if (!bedsideActionAllowed(action, order.status, syringeState(releases))) throw new ConflictException(WHY_NOT[action]);
}
