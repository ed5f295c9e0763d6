import type { SyringeReading } from '@lockstep/shared';
import { type EntityManager, In, MoreThanOrEqual } from 'typeorm';
import { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import { Observation } from './entities/observation.entity.js';

/**
 * An order's observations since `since` (time order, by index) and the pump readings they give:
 * each syringe's counters start at zero when its bedside check matched. The usage figures and the
 * clinician bolus limits both read the pump this way.
 */
export async function pumpReadingsSince(
  manager: EntityManager,
  orderId: number,
  since: Date,
): Promise<{ observations: Observation[]; readings: SyringeReading[] }> {
  const observations = await manager.find(Observation, { where: { orderId, at: MoreThanOrEqual(since) }, order: { at: 'ASC', id: 'ASC' } });
  const releaseIds = [...new Set(observations.map((observation) => observation.releaseId))];
  const starts =
    releaseIds.length === 0 ? [] : await manager.find(BedsideCheck, { where: { orderId, status: 'matched', releaseId: In(releaseIds) } });
  const readings: SyringeReading[] = [
    ...starts.map((check) => ({
      syringeId: check.releaseId,
      at: (check.secondAt ?? check.firstAt).toISOString(),
      attempts: 0,
      delivered: 0,
      volumeInfusedMl: 0,
    })),
    ...observations.map((o) => ({
      syringeId: o.releaseId,
      at: o.at.toISOString(),
      attempts: o.attempts,
      delivered: o.delivered,
      volumeInfusedMl: o.volumeInfusedMl,
    })),
  ];
  return { observations, readings };
}
