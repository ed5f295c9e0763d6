import { ConflictException } from '@nestjs/common';
import { In, type EntityManager } from 'typeorm';
import { duplicatePcaMessage, ONE_PCA_STATUSES, openPcaFor, type OtherPcaOrder } from '@lockstep/shared';
import { PcaOrder } from './entities/pca-order.entity.js';

/** The patient's open PCA that a new order would duplicate (shared `openPcaFor` decides), or null. */
export async function findOpenPca(manager: EntityManager, patientId: number, revising?: number): Promise<OtherPcaOrder | null> {
  const orders = await manager.find(PcaOrder, {
    where: { patientId, status: In([...ONE_PCA_STATUSES]) },
    relations: { drug: true },
    order: { id: 'ASC' },
  });
  return openPcaFor(
    orders.map((order) => ({
      id: order.id,
      status: order.status,
      drugName: order.drug.genericName,
      doseUnit: order.doseUnit,
      concentrationPerMl: order.concentrationPerMl,
    })),
    revising,
  );
}

/** 409 naming the open order and what to do about it; `openOrderId` lets a screen link to it. */
export function duplicatePcaConflict(open: OtherPcaOrder): ConflictException {
  return new ConflictException({ statusCode: 409, message: duplicatePcaMessage(open), openOrderId: open.id });
}
