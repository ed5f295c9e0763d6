import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { BEDSIDE_ROLES, type DiscontinueResponse, type ReconciliationResponse, type SyringeChangeResponse } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { FlagsService } from '../flags/flags.service.js';
import { MailService } from '../mail/mail.service.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { statusConflict, transitionOrder } from '../orders/order-transitions.js';
import { OrdersService } from '../orders/orders.service.js';
import { UsersService } from '../users/users.service.js';
import { readyRelease } from './ready-release.js';
import type { DiscontinueDto, SyringeChangeDto } from './dto/bedside-actions.dto.js';
import { requireBedsideAction } from './bedside-state.js';
import { finishRunningSyringe } from './reconcile-release.js';
import { discrepancyFlag, discrepancyMail, reconciliationAuditSummary } from './reconciliation-records.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { recordAudit } from '../audit/record-audit.js';

/** The end of a syringe: a change to a new one, or discontinuing the PCA. Both reconcile with witnessed waste. */
@Injectable()
export class SyringeEndService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly users: UsersService,
    private readonly flags: FlagsService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  async change(orderId: number, dto: SyringeChangeDto, nurse: AuthUser): Promise<SyringeChangeResponse> {
    const witness = await this.users.verifyColleague(dto.witness.username, dto.witness.password, BEDSIDE_ROLES, nurse.id, 'witness');
    const { order, reconciliation, newReleaseCode } = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, orderId);
      if (found.status !== 'active') throw statusConflict(found.status, 'active');
      await requireBedsideAction(manager, found, 'syringe-change');
      const next = await readyRelease(manager, found, dto.newReleaseCode, 'newReleaseCode');
      const result = await this.finish(manager, found, dto, nurse.id, witness.id);
      await recordAudit(manager, nurse, {
        action: 'order.syringe-change',
        entityType: 'order',
        entityId: orderId,
        summary: { ...reconciliationAuditSummary(result), newReleaseCode: next.releaseCode, witness: witness.displayName },
      });
      return { order: found, reconciliation: result, newReleaseCode: next.releaseCode };
    });
    this.reportDiscrepancy(order, reconciliation);
    this.events.publishForOrder(orderId, 'release');
    return { reconciliation, newReleaseCode, nextStep: 'Two nurses do a bedside check to start the new syringe' };
  }

  async discontinue(orderId: number, dto: DiscontinueDto, nurse: AuthUser): Promise<DiscontinueResponse> {
    const witness = await this.users.verifyColleague(dto.witness.username, dto.witness.password, BEDSIDE_ROLES, nurse.id, 'witness');
    const { order, reconciliation } = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, orderId);
      if (found.status !== 'active') throw statusConflict(found.status, 'discontinued');
      await requireBedsideAction(manager, found, 'discontinue');
      const result = await this.finish(manager, found, dto, nurse.id, witness.id);
      await transitionOrder(manager, found, 'discontinued', nurse.id, dto.reason.trim());
      await recordAudit(manager, nurse, {
        action: 'order.discontinue',
        entityType: 'order',
        entityId: orderId,
        summary: {
          status: { from: found.status, to: 'discontinued' },
          reason: dto.reason.trim(),
          ...reconciliationAuditSummary(result),
          witness: witness.displayName,
        },
      });
      return { order: found, reconciliation: result };
    });
    this.reportDiscrepancy(order, reconciliation);
    this.events.publishForOrder(orderId, 'order');
    return { order: await this.orders.get(orderId), reconciliation };
  }

  private async finish(
    manager: EntityManager,
    order: PcaOrder,
    volumes: { volumeInfusedMl: number; wastedMl: number },
    nurseId: number,
    witnessId: number,
  ) {
    const result = await finishRunningSyringe(
      manager,
      order.id,
      { infusedMl: volumes.volumeInfusedMl, wastedMl: volumes.wastedMl },
      { recordedById: nurseId, witnessId },
      order.patient.ward.reconciliationToleranceMl,
    );
    if (result.mustReport) await this.flags.raise(manager, { orderId: order.id, ...discrepancyFlag(result, result.releaseCode) });
    return result;
  }

  private reportDiscrepancy(order: PcaOrder, reconciliation: ReconciliationResponse & { releaseCode?: string }): void {
    if (!reconciliation.mustReport) return;
    this.mail.send(discrepancyMail(order, reconciliation));
  }
}
