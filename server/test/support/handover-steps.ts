import type { PumpSettings } from '@lockstep/shared';
import type { DataSource } from 'typeorm';
import { PcaOrder } from '../../src/orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../../src/releases/entities/syringe-release.entity.js';

/** What the pump of a running PCA should hold: its order and running syringe, as a nurse would read them off the pump. */
export async function runningSettings(dataSource: DataSource, orderId: number): Promise<PumpSettings> {
  const order = await dataSource.manager.findOneByOrFail(PcaOrder, { id: orderId });
  const release = await dataSource.manager.findOneByOrFail(SyringeRelease, { orderId, status: 'in_use' });
  return {
    drugId: order.drugId,
    concentrationPerMl: order.concentrationPerMl,
    syringeVolumeMl: release.volumeMl,
    loadingDose: order.loadingDose,
    demandDose: order.demandDose,
    lockoutMinutes: order.lockoutMinutes,
    basalRatePerHour: order.basalRatePerHour,
    oneHourLimit: order.oneHourLimit,
    fourHourLimit: order.fourHourLimit,
  };
}
