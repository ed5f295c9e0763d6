import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import {
  BEDSIDE_ROLES,
  compareSettings,
  pendingCheckRefusal,
  wristbandErrors,
  type FirstCheckResponse,
  type PumpSettings,
  type SecondCheckResponse,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { statusConflict, transitionOrder } from '../orders/order-transitions.js';
import { OrdersService } from '../orders/orders.service.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { UsersService } from '../users/users.service.js';
import type { FirstCheckDto, SecondCheckDto } from './dto/bedside-check.dto.js';
import { BedsideCheck } from './entities/bedside-check.entity.js';
import { requireBedsideAction } from './bedside-state.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldErrors } from '../common/errors/field-error.js';
import { readyRelease } from './ready-release.js';

/**
 * The independent double-check. The first nurse identifies the patient and syringe and enters the
 * pump settings; a second nurse signs in on the same screen and enters them blind. Only when both
 * equal the verified order does the syringe (and, at the start, the order) go live.
 */
@Injectable()
export class BedsideChecksService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly users: UsersService,
    private readonly events: WardEventsService,
  ) {}

  async first(orderId: number, dto: FirstCheckDto, nurse: AuthUser): Promise<FirstCheckResponse> {
    return this.dataSource.transaction(async (manager) => {
      const order = await this.orders.load(manager, orderId);
      if (order.status !== 'verified' && order.status !== 'active') throw statusConflict(order.status, 'active');
      checkIdentity(order, dto);
      const release = await readyRelease(manager, order, dto.releaseCode, 'releaseCode');
      await requireBedsideAction(manager, order, 'check');
      // One pending check per syringe: read inside the (queued) transaction, so 20 at once start one.
      const pendingRefusal = pendingCheckRefusal(
        await manager.findBy(BedsideCheck, { releaseId: release.id, status: 'awaiting_second' }),
        release.id,
      );
      if (pendingRefusal) throw new ConflictException({ statusCode: 409, message: pendingRefusal, field: 'releaseCode' });
      const check = await manager.save(
        manager.create(BedsideCheck, {
          orderId,
          releaseId: release.id,
          status: 'awaiting_second',
          firstNurseId: nurse.id,
          firstSettings: { ...dto.settings },
          firstAt: new Date(),
        }),
      );
      await recordAudit(manager, nurse, {
        action: 'order.bedside-first-check',
        entityType: 'order',
        entityId: orderId,
        summary: { checkId: check.id, releaseCode: release.releaseCode, settings: dto.settings },
      });
      return { id: check.id, status: 'awaiting_second' };
    });
  }

  async second(orderId: number, checkId: number, dto: SecondCheckDto): Promise<SecondCheckResponse> {
    const pending = await this.dataSource.manager.findOneBy(BedsideCheck, { id: checkId, orderId });
    if (!pending) throw new NotFoundException(`No bedside check ${checkId} for order ${orderId}`);
    const colleague = await this.users.verifyColleague(dto.username, dto.password, BEDSIDE_ROLES, pending.firstNurseId);

    const result = await this.dataSource.transaction(async (manager) => {
      const check = await manager.findOneByOrFail(BedsideCheck, { id: checkId });
      if (check.status !== 'awaiting_second') throw new ConflictException('This check is already complete: start a new bedside check');
      const order = await this.orders.load(manager, orderId);
      const release = await manager.findOneByOrFail(SyringeRelease, { id: check.releaseId });
      const differences = compareSettings(check.firstSettings, dto.settings, orderedSettings(order, release));
      const status: SecondCheckResponse['status'] = differences.length === 0 ? 'matched' : 'mismatch';

      const saved = await manager.update(
        BedsideCheck,
        { id: checkId, status: 'awaiting_second', rowVersion: check.rowVersion },
        {
          status,
          secondNurseId: colleague.id,
          secondSettings: { ...dto.settings },
          secondAt: new Date(),
          differences,
          rowVersion: check.rowVersion + 1,
        },
      );
      if (saved.affected !== 1) throw new ConflictException('This check was completed by someone else a moment ago');
      if (status === 'matched') await this.start(manager, order, release, check.firstNurseId, colleague.displayName);
      await recordAudit(manager, colleague, {
        action: 'order.bedside-second-check',
        entityType: 'order',
        entityId: orderId,
        summary: {
          checkId,
          result: status,
          releaseCode: release.releaseCode,
          ...(differences.length > 0 ? { differences } : {}),
          ...(status === 'matched' && order.status === 'verified' ? { status: { from: 'verified', to: 'active' } } : {}),
        },
      });
      return { id: checkId, status, differences };
    });
    if (result.status === 'matched') this.events.publishForOrder(orderId, 'order');
    return result;
  }

  private async start(
    manager: EntityManager,
    order: PcaOrder,
    release: SyringeRelease,
    firstNurseId: number,
    secondName: string,
  ): Promise<void> {
    const started = await manager.update(
      SyringeRelease,
      { id: release.id, status: 'ready' },
      { status: 'in_use', rowVersion: release.rowVersion + 1 },
    );
    if (started.affected !== 1) throw new ConflictException('This syringe is no longer ready: it was started or finished a moment ago');
    if (order.status === 'verified') {
      await transitionOrder(manager, order, 'active', firstNurseId, `Bedside check matched; second check by ${secondName}`, {
        startedAt: new Date(),
      });
    }
  }
}

function checkIdentity(order: PcaOrder, dto: FirstCheckDto): void {
  const errors = wristbandErrors(dto, order.patient);
  if (errors.length > 0) throw fieldErrors('The patient does not match this order: stop and check the wristband', errors);
}

function orderedSettings(order: PcaOrder, release: SyringeRelease): PumpSettings {
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
