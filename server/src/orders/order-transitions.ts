import { ConflictException } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { canTransition, ORDER_STATUS_LABELS, type OrderStatus } from '@lockstep/shared';
import { OrderEvent } from './entities/order-event.entity.js';
import { PcaOrder } from './entities/pca-order.entity.js';

/**
 * The one place an order's status changes: checks the lifecycle, writes the status with an
 * optimistic-lock guard, and records who, when and why. 409 with the current status otherwise.
 */
export async function transitionOrder(
  manager: EntityManager,
  order: PcaOrder,
  to: OrderStatus,
  userId: number,
  reason: string | null,
  changes: Partial<PcaOrder> = {},
): Promise<void> {
  if (!canTransition(order.status, to)) throw statusConflict(order.status, to);
  const at = new Date();
  const result = await manager.update(
    PcaOrder,
    { id: order.id, rowVersion: order.rowVersion, status: order.status },
    { ...changes, status: to, statusChangedAt: at, statusReason: reason, rowVersion: order.rowVersion + 1 },
  );
  if (result.affected !== 1) {
    const current = await manager.findOneByOrFail(PcaOrder, { id: order.id });
    throw statusConflict(current.status, to);
  }
  await manager.insert(OrderEvent, { orderId: order.id, fromStatus: order.status, toStatus: to, userId, at, reason });
}

export function statusConflict(current: OrderStatus, wanted: OrderStatus): ConflictException {
  return new ConflictException({
    statusCode: 409,
    message: `This order is ${ORDER_STATUS_LABELS[current].toLowerCase()}, so it cannot become ${ORDER_STATUS_LABELS[wanted].toLowerCase()}`,
    currentStatus: current,
  });
}
