import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, In, IsNull } from 'typeorm';
import {
  blockingFindings,
  type Finding,
  type OrderDetail,
  type OrderListEntry,
  type OrderStatus,
  OPEN_ORDER_STATUSES,
  otherOpioidOrders,
  type OtherPcaOrder,
  reasonsToKeep,
  regimenTypeOf,
  syringeState,
  unexplainedSoftFindings,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { Observation } from '../observations/entities/observation.entity.js';
import { monitoringEvents, nextObservationFor } from '../observations/next-observation.js';
import { toLimitRuleResponse } from '../library/dto/library-response.js';
import { MailService } from '../mail/mail.service.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { PcaPause } from '../bedside/entities/pca-pause.entity.js';
import { UsersService } from '../users/users.service.js';
import type { CreateOrderDto } from './dto/create-order.dto.js';
import { ORDER_SUMMARY_RELATIONS, toOrderDetail, toOrderSummary } from './dto/order-response.js';
import { storedDate } from '../database/stored-date.js';
import type { OrderQueryDto } from './dto/order-query.dto.js';
import { OrderEvent } from './entities/order-event.entity.js';
import { PcaOrder } from './entities/pca-order.entity.js';
import { orderAwaitingVerificationMail } from './order-notifications.js';
import { OrderPreviewService } from './order-preview.service.js';
import { statusConflict, transitionOrder } from './order-transitions.js';
import { duplicatePcaConflict, findOpenPca } from './open-pca.js';
import { orderAuditSummary } from './order-audit.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldErrors } from '../common/errors/field-error.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';

const DETAIL_RELATIONS = { ...ORDER_SUMMARY_RELATIONS, verifiedBy: true } as const;

/**
 * The wards an order list is narrowed to: `wardId`, `wardIds`, or only the wards in both when both
 * are given (none, then). Undefined: every ward.
 */
function askedWards(query: Pick<OrderQueryDto, 'wardId' | 'wardIds'>): number[] | undefined {
  if (!query.wardIds) return query.wardId ? [query.wardId] : undefined;
  const wards = [...new Set(query.wardIds)];
  return query.wardId ? wards.filter((id) => id === query.wardId) : wards;
}

/** Signing, revising, cancelling and reading PCA orders. */
@Injectable()
export class OrdersService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly previews: OrderPreviewService,
    private readonly users: UsersService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  /** The server re-checks the order itself; hard and error findings refuse it, soft ones need a reason. */
  async create(dto: CreateOrderDto, prescriber: AuthUser, revising?: number): Promise<OrderDetail> {
    await this.users.verifySignature(prescriber.id, dto.signature.password);
    // A revision of an order that is no longer returned is a status conflict, said as such first.
    if (revising !== undefined) await this.revisable(this.dataSource.manager, revising, dto.patientId);
    await this.refuseSecondPca(this.dataSource.manager, dto.patientId, revising);
    const { findings, rule } = await this.previews.evaluate(dto);
    const overrides = checkSignable(findings, dto);

    const id = await this.dataSource.transaction(async (manager) => {
      const previous = revising === undefined ? null : await this.revisable(manager, revising, dto.patientId);
      // Again inside the transaction: another prescriber may have signed one since the check above.
      await this.refuseSecondPca(manager, dto.patientId, revising);
      const now = new Date();
      const { identifiers } = await manager.insert(PcaOrder, {
        patientId: dto.patientId,
        prescriberId: prescriber.id,
        drugId: dto.drugId,
        status: 'awaiting_verification',
        regimenType: regimenTypeOf(dto.basalRatePerHour),
        version: previous ? previous.version + 1 : 1,
        supersedesId: previous?.id ?? null,
        concentrationPerMl: dto.concentrationPerMl,
        doseUnit: dto.doseUnit,
        loadingDose: dto.loadingDose ?? null,
        demandDose: dto.demandDose,
        lockoutMinutes: dto.lockoutMinutes,
        basalRatePerHour: dto.basalRatePerHour,
        oneHourLimit: dto.oneHourLimit ?? null,
        fourHourLimit: dto.fourHourLimit ?? null,
        clinicianBolusDose: dto.clinicianBolusDose ?? null,
        indication: dto.indication?.trim() ?? '',
        reviewDate: dto.reviewDate,
        ruleSnapshot: rule ? toLimitRuleResponse(rule) : null,
        findingsSnapshot: findings,
        overrides,
        signedAt: now,
        statusChangedAt: now,
        statusReason: null,
      });
      const orderId = identifiers[0].id as number;
      await manager.insert(OrderEvent, {
        orderId,
        fromStatus: null,
        toStatus: 'awaiting_verification',
        userId: prescriber.id,
        at: now,
        reason: previous ? `Revision of order ${previous.id}` : null,
      });
      await recordAudit(manager, prescriber, {
        action: previous ? 'order.revise' : 'order.create',
        entityType: 'order',
        entityId: orderId,
        summary: orderAuditSummary(dto, previous?.id),
      });
      if (previous) {
        await transitionOrder(manager, previous, 'superseded', prescriber.id, `Revised as order ${orderId}`);
        await recordAudit(manager, prescriber, {
          action: 'order.revise',
          entityType: 'order',
          entityId: previous.id,
          summary: { status: { from: previous.status, to: 'superseded' }, revisedAs: orderId },
        });
      }
      return orderId;
    });

    const entity = await this.load(this.dataSource.manager, id);
    this.mail.send(orderAwaitingVerificationMail(entity));
    this.events.publishForOrder(id, 'order');
    return this.detail(entity);
  }

  async cancel(id: number, reason: string, user: AuthUser): Promise<OrderDetail> {
    await this.dataSource.transaction(async (manager) => {
      const order = await this.load(manager, id);
      await transitionOrder(manager, order, 'cancelled', user.id, reason);
      await recordAudit(manager, user, {
        action: 'order.cancel',
        entityType: 'order',
        entityId: id,
        summary: { status: { from: order.status, to: 'cancelled' }, reason },
      });
    });
    this.events.publishForOrder(id, 'order');
    return this.get(id);
  }

  /** Newest first, each with its syringe state and next observation: three queries however many orders. */
  async list(query: OrderQueryDto, user: AuthUser, now = new Date()): Promise<OrderListEntry[]> {
    const wards = askedWards(query);
    if (wards?.length === 0) return [];
    const manager = this.dataSource.manager;
    const orders = await manager.find(PcaOrder, {
      where: {
        ...(query.status ? { status: In(query.status) } : {}),
        ...(query.patientId ? { patientId: query.patientId } : {}),
        ...(wards ? { patient: { wardId: wards.length === 1 ? wards[0] : In(wards) } } : {}),
        ...(query.mine ? { prescriberId: user.id } : {}),
      },
      relations: ORDER_SUMMARY_RELATIONS,
      order: { id: 'DESC' },
      take: 1000,
    });
    const ids = orders.map((order) => order.id);
    const running = orders.filter((order) => order.status === 'active').map((order) => order.id);
    const [releases, latest, events, urgent, pauses] = await Promise.all([
      ids.length === 0
        ? []
        : manager.find(SyringeRelease, {
            select: { id: true, orderId: true, status: true },
            where: { orderId: In(ids), status: In(['ready', 'in_use']) },
          }),
      running.length === 0
        ? []
        : manager
            .createQueryBuilder(Observation, 'o')
            .select('o.orderId', 'orderId')
            .addSelect('max(o.at)', 'at')
            .where('o.orderId IN (:...running)', { running })
            .groupBy('o.orderId')
            .getRawMany<{ orderId: number; at: string }>(),
      monitoringEvents(manager, running),
      ids.length === 0
        ? []
        : manager
            .createQueryBuilder(Flag, 'f')
            .select('f.orderId', 'orderId')
            .addSelect('count(*)', 'open')
            .where("f.orderId IN (:...ids) AND f.severity = 'urgent' AND f.acknowledgedAt IS NULL", { ids })
            .groupBy('f.orderId')
            .getRawMany<{ orderId: number; open: number }>(),
      running.length === 0
        ? []
        : manager.find(PcaPause, { select: { id: true, orderId: true }, where: { orderId: In(running), resumedAt: IsNull() } }),
    ]);
    const paused = new Set(pauses.map((pause) => pause.orderId));
    const openUrgent = new Map(urgent.map((row) => [Number(row.orderId), Number(row.open)]));
    const lastObservedAt = new Map(latest.map((row) => [Number(row.orderId), storedDate(row.at)]));
    const patientOrders = await this.unfinishedOrdersOf(manager, [...new Set(orders.map((order) => order.patientId))]);
    return orders.map((order) => ({
      ...toOrderSummary(order),
      syringeState: syringeState(releases.filter((release) => release.orderId === order.id)),
      nextObservation: nextObservationFor(order, lastObservedAt.get(order.id) ?? null, events.get(order.id) ?? [], now),
      openUrgentFlags: openUrgent.get(order.id) ?? 0,
      paused: paused.has(order.id),
      otherOpenOrders: otherOpioidOrders(patientOrders.get(order.patientId) ?? [], order.id),
    }));
  }

  /** Each patient's unfinished orders, in one query, for the queue's duplicate-therapy mark. */
  private async unfinishedOrdersOf(manager: EntityManager, patientIds: number[]): Promise<Map<number, OtherPcaOrder[]>> {
    const byPatient = new Map<number, OtherPcaOrder[]>();
    if (patientIds.length === 0) return byPatient;
    const rows = await manager.find(PcaOrder, {
      select: { id: true, patientId: true, status: true, doseUnit: true, concentrationPerMl: true, drug: { id: true, genericName: true } },
      where: { patientId: In(patientIds), status: In(OPEN_ORDER_STATUSES) },
      relations: { drug: true },
      order: { id: 'ASC' },
    });
    for (const row of rows) {
      const entry = {
        id: row.id,
        status: row.status,
        drugName: row.drug.genericName,
        doseUnit: row.doseUnit,
        concentrationPerMl: row.concentrationPerMl,
      };
      byPatient.set(row.patientId, [...(byPatient.get(row.patientId) ?? []), entry]);
    }
    return byPatient;
  }

  async get(id: number): Promise<OrderDetail> {
    return this.detail(await this.load(this.dataSource.manager, id));
  }

  /** The detail answer for an order already loaded with its relations. */
  private async detail(order: PcaOrder): Promise<OrderDetail> {
    const manager = this.dataSource.manager;
    const id = order.id;
    const events = await manager.find(OrderEvent, { where: { orderId: id }, relations: { user: true }, order: { id: 'ASC' } });
    const releases = await manager.find(SyringeRelease, { where: { orderId: id }, relations: { releasedBy: true }, order: { id: 'ASC' } });
    const flags = await manager.find(Flag, { where: { orderId: id }, relations: { acknowledgedBy: true }, order: { id: 'DESC' } });
    const last =
      order.status === 'active'
        ? await manager.findOne(Observation, { select: { id: true, at: true }, where: { orderId: id }, order: { at: 'DESC', id: 'DESC' } })
        : null;
    const schedule = order.status === 'active' ? await monitoringEvents(manager, [id]) : new Map();
    const paused = order.status === 'active' && (await manager.existsBy(PcaPause, { orderId: id, resumedAt: IsNull() }));
    const next = nextObservationFor(order, last?.at ?? null, schedule.get(id) ?? [], new Date());
    return toOrderDetail(order, events, releases, flags, next, paused);
  }

  async load(manager: EntityManager, id: number): Promise<PcaOrder> {
    const order = await manager.findOne(PcaOrder, { where: { id }, relations: DETAIL_RELATIONS });
    if (!order) throw new NotFoundException(`No order with id ${id}`);
    return order;
  }

  private async refuseSecondPca(manager: EntityManager, patientId: number, revising?: number): Promise<void> {
    const open = await findOpenPca(manager, patientId, revising);
    if (open) throw duplicatePcaConflict(open);
  }

  private async revisable(manager: EntityManager, id: number, patientId: number): Promise<PcaOrder> {
    const previous = await this.load(manager, id);
    if (previous.status !== 'returned') throw statusConflict(previous.status, 'superseded' satisfies OrderStatus);
    if (previous.patientId !== patientId) {
      throw fieldErrors('A revision is for the same patient', [
        { field: 'patientId', message: 'A revision is for the same patient as the order it revises' },
      ]);
    }
    return previous;
  }
}

/** Refuses hard and error findings; demands a reason for each soft one. Answers the overrides to keep. */
function checkSignable(findings: Finding[], dto: CreateOrderDto): CreateOrderDto['overrides'] {
  const blocking = blockingFindings(findings);
  if (blocking.length > 0) {
    throw fieldErrors(
      'This order cannot be signed: correct the values outside the hard limits',
      blocking.map((finding) => ({ field: finding.field, message: finding.message })),
    );
  }
  const unexplained = unexplainedSoftFindings(findings, dto.overrides);
  if (unexplained.length > 0) {
    throw fieldErrors(
      'Give a reason for each value outside a soft limit',
      unexplained.map((finding) => ({ field: finding.field, message: `Reason needed: ${finding.message}` })),
    );
  }
  return reasonsToKeep(findings, dto.overrides);
}
