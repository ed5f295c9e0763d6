import { ConflictException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, IsNull, MoreThanOrEqual } from 'typeorm';
import { BEDSIDE_ROLES, type BolusResponse, bolusLimitRefusal, bolusSafetyRefusal, checkAgainstRule, formatDose } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { statusConflict } from '../orders/order-transitions.js';
import { OrdersService } from '../orders/orders.service.js';
import { UsersService } from '../users/users.service.js';
import type { BolusDto } from './dto/bedside-actions.dto.js';
import { requireBedsideAction } from './bedside-state.js';
import { ClinicianBolus } from './entities/clinician-bolus.entity.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { Observation } from '../observations/entities/observation.entity.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { PcaPause } from './entities/pca-pause.entity.js';
import { pumpReadingsSince } from '../observations/pump-readings.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldError } from '../common/errors/field-error.js';

/** A clinician bolus: within the order's bolus dose and the ward rule, co-signed by a second nurse. */
@Injectable()
export class BolusesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly users: UsersService,
  ) {}

  async give(orderId: number, dto: BolusDto, nurse: AuthUser): Promise<BolusResponse> {
    const witness = await this.users.verifyColleague(dto.witness.username, dto.witness.password, BEDSIDE_ROLES, nurse.id, 'witness');
    return this.dataSource.transaction(async (manager) => {
      const order = await this.orders.load(manager, orderId);
      if (order.status !== 'active') throw statusConflict(order.status, 'active');
      await requireBedsideAction(manager, order, 'bolus');
      if (await manager.existsBy(PcaPause, { orderId, resumedAt: IsNull() })) {
        throw new ConflictException('This PCA is paused: resume it (two-nurse check of the pump) before giving a bolus');
      }
      const unit = order.doseUnit;
      if (order.clinicianBolusDose === null) throw fieldError('amount', 'This order has no clinician bolus: ask the prescriber');
      if (dto.amount > order.clinicianBolusDose + 1e-9) {
        throw fieldError(
          'amount',
          `${formatDose(dto.amount, unit)} is more than the ordered clinician bolus of ${formatDose(order.clinicianBolusDose, unit)}`,
        );
      }
      const rule = order.ruleSnapshot;
      const limits = rule?.limits.clinicianBolusDose;
      if (rule && limits) {
        const weight = order.patient.weightKg;
        const value = rule.perKg && weight ? dto.amount / weight : dto.amount;
        const result = checkAgainstRule(value, limits);
        if (result === 'hard-high' || result === 'hard-low')
          throw fieldError('amount', `${formatDose(dto.amount, unit)} is outside the ward's hard limit for a clinician bolus`);
        if ((result === 'soft-high' || result === 'soft-low') && !dto.overrideReason?.trim()) {
          const message = `${formatDose(dto.amount, unit)} is outside the ward's soft limit for a clinician bolus: give a reason`;
          throw fieldError('overrideReason', message);
        }
      }
      const now = new Date();
      await refuseUnsafeBolus(manager, order, dto.amount, now);
      const bolus = await manager.save(
        manager.create(ClinicianBolus, {
          orderId,
          amount: dto.amount,
          reason: dto.reason.trim(),
          overrideReason: dto.overrideReason?.trim() ?? null,
          givenById: nurse.id,
          witnessId: witness.id,
          at: now,
        }),
      );
      await recordAudit(manager, nurse, {
        action: 'order.bolus',
        entityType: 'order',
        entityId: orderId,
        summary: {
          bolusId: bolus.id,
          amount: bolus.amount,
          doseUnit: unit,
          reason: bolus.reason,
          overrideReason: bolus.overrideReason,
          witness: witness.displayName,
        },
      });
      return {
        id: bolus.id,
        orderId,
        amount: bolus.amount,
        doseUnit: unit,
        reason: bolus.reason,
        overrideReason: bolus.overrideReason,
        givenByName: nurse.displayName,
        witnessName: witness.displayName,
        at: bolus.at.toISOString(),
      };
    });
  }
}

const FOUR_HOURS_MS = 4 * 3_600_000;

/**
 * The shared bolus checks against the record (409 with "contact the prescriber"): the latest
 * observation's sedation and the open urgent breathing flags (`bolusSafetyRefusal`), then the
 * hour's and 4 hours' total with this bolus against the order's limits (`bolusLimitRefusal`), from
 * the pump totals of the last 4 hours (each syringe starting at zero at its matched bedside check,
 * as the usage figures read them) and the clinician boluses given in them.
 */
async function refuseUnsafeBolus(manager: EntityManager, order: PcaOrder, amount: number, now: Date): Promise<void> {
  const last = await manager.findOne(Observation, { where: { orderId: order.id }, order: { at: 'DESC', id: 'DESC' } });
  const open = await manager.findBy(Flag, { orderId: order.id, severity: 'urgent', acknowledgedAt: IsNull() });
  const safety = bolusSafetyRefusal({ lastSedation: last?.sedationLevel ?? null, openUrgentFlagCodes: open.map((flag) => flag.code) });
  if (safety) throw new ConflictException(safety);

  // A day before the window as well, so the first reading inside it has the one before it.
  const since = new Date(now.getTime() - FOUR_HOURS_MS - 24 * 3_600_000);
  const { readings } = await pumpReadingsSince(manager, order.id, since);
  const boluses = await manager.find(ClinicianBolus, {
    where: { orderId: order.id, at: MoreThanOrEqual(new Date(now.getTime() - FOUR_HOURS_MS)) },
  });
  const limit = bolusLimitRefusal(
    amount,
    readings,
    boluses.map((bolus) => ({ at: bolus.at.toISOString(), amount: bolus.amount })),
    {
      doseUnit: order.doseUnit,
      demandDose: order.demandDose,
      basalRatePerHour: order.basalRatePerHour,
      oneHourLimit: order.oneHourLimit,
      fourHourLimit: order.fourHourLimit,
      startedAt: order.startedAt?.toISOString() ?? null,
    },
    now,
  );
  if (limit) throw new ConflictException(limit);
}
