import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, MoreThanOrEqual } from 'typeorm';
import { projectedEmptyAt, type UsageResponse, usageSummary } from '@lockstep/shared';
import { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
import { EquianalgesicService } from '../equianalgesic/equianalgesic.service.js';
import { OrdersService } from '../orders/orders.service.js';
import { pumpReadingsSince } from './pump-readings.js';
import { Observation } from './entities/observation.entity.js';
import { monitoringEvents, nextObservationFor } from './next-observation.js';

/** Hourly use, the 24-hour total, oral-morphine equivalent, projected syringe-empty time and the next observation due. */
@Injectable()
export class UsageService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly equianalgesic: EquianalgesicService,
  ) {}

  async usage(orderId: number, hours: number, now = new Date()): Promise<UsageResponse> {
    const manager = this.dataSource.manager;
    const order = await this.orders.load(manager, orderId);
    // Only the readings the figures can use (the window, the rolling 24 hours, and a day before
    // them for the first differences), by index: a PCA running for weeks reads no more than a new one.
    const since = new Date(now.getTime() - Math.max(hours, 24) * 3_600_000 - 24 * 3_600_000);
    const { observations: recent, readings } = await pumpReadingsSince(manager, orderId, since);
    const last = recent.at(-1) ?? (await manager.findOne(Observation, { where: { orderId }, order: { at: 'DESC', id: 'DESC' } }));
    const boluses = await manager.find(ClinicianBolus, { where: { orderId, at: MoreThanOrEqual(since) } });
    // Pharmacy's equianalgesic table, read by the order's formulary drug id (never by its name).
    const factors = await this.equianalgesic.factorsFor(manager, order.drugId);
    const summary = usageSummary(
      readings,
      boluses.map((bolus) => ({ at: bolus.at.toISOString(), amount: bolus.amount })),
      { concentrationPerMl: order.concentrationPerMl, doseUnit: order.doseUnit, conversion: factors?.conversion ?? null },
      now,
      hours,
    );
    const oralMorphineFactors =
      factors && summary.oralMorphineEquivalent24hMg !== null
        ? {
            parenteralAmount: factors.conversion.parenteralAmount,
            parenteralUnit: factors.conversion.parenteralUnit,
            parenteralSource: factors.parenteralSource,
            oralMorphineMg: factors.conversion.oralMorphineMg,
            oralSource: factors.oralSource,
          }
        : null;

    const syringeReadings = last
      ? readings.filter((reading) => reading.syringeId === last.releaseId).sort((x, y) => Date.parse(x.at) - Date.parse(y.at))
      : [];
    const projected =
      last && order.status === 'active'
        ? projectedEmptyAt(syringeReadings, last.syringeRemainingMl, order.basalRatePerHour / order.concentrationPerMl)
        : null;
    const schedule = order.status === 'active' ? await monitoringEvents(manager, [order.id]) : new Map();
    const nextObservation = nextObservationFor(order, last?.at ?? null, schedule.get(order.id) ?? [], now);
    return { ...summary, oralMorphineFactors, doseUnit: order.doseUnit, projectedEmptyAt: projected, nextObservation };
  }
}
