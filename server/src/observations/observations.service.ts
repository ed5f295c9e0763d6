import { ConflictException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, LessThanOrEqual, MoreThan } from 'typeorm';
import {
  type FlagDraft,
  observationFlags,
  type ObservationResponse,
  observationTimelineErrors,
  ORDER_STATUS_LABELS,
  type RecordedObservation,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { FlagsService } from '../flags/flags.service.js';
import { MailService } from '../mail/mail.service.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { OrdersService } from '../orders/orders.service.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { wardPolicy } from '../wards/ward-policy.js';
import type { CreateObservationDto } from './dto/create-observation.dto.js';
import { toObservationResponse } from './dto/observation-response.js';
import { Observation } from './entities/observation.entity.js';
import { observationAuditSummary } from './observation-audit.js';
import { syringeLowMail, urgentFlagsMail } from './observation-notifications.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldErrors } from '../common/errors/field-error.js';
import { requireBedsideAction } from '../bedside/bedside-state.js';

@Injectable()
export class ObservationsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly flags: FlagsService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  async record(orderId: number, dto: CreateObservationDto, nurse: AuthUser): Promise<RecordedObservation> {
    const { order, observation, raised } = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, orderId);
      if (found.status !== 'active') {
        throw new ConflictException({
          statusCode: 409,
          message: `Observations are recorded on an active PCA; this one is ${ORDER_STATUS_LABELS[found.status].toLowerCase()}`,
          currentStatus: found.status,
        });
      }
      await requireBedsideAction(manager, found, 'observe');
      const release = await manager.findOneByOrFail(SyringeRelease, { orderId, status: 'in_use' });
      const at = dto.at ? new Date(dto.at) : new Date();
      const { previous } = await checkTimeline(manager, found, release, at, dto);

      const saved = await manager.save(
        manager.create(Observation, { ...dto, at, orderId, releaseId: release.id, note: dto.note?.trim() ?? '', recordedById: nurse.id }),
      );
      const drafts = observationFlags(
        { ...dto, at: at.toISOString() },
        previous ? { ...previous, at: previous.at.toISOString() } : null,
        found.basalRatePerHour / found.concentrationPerMl,
        wardPolicy(found.patient.ward),
      );
      const flags: (FlagDraft & { id: number })[] = [];
      for (const draft of drafts) {
        const oncePerSyringe = draft.code === 'syringe.low';
        if (oncePerSyringe && (await manager.existsBy(Flag, { orderId, releaseId: release.id, code: draft.code }))) continue;
        const flag = await this.flags.raise(manager, { ...draft, orderId, releaseId: oncePerSyringe ? release.id : null });
        flags.push({ ...draft, id: flag.id });
      }
      await recordAudit(manager, nurse, {
        action: 'order.observation',
        entityType: 'order',
        entityId: orderId,
        summary: observationAuditSummary(
          { ...dto, id: saved.id, at },
          flags.map((flag) => flag.code),
        ),
      });
      const withUser = await manager.findOneOrFail(Observation, { where: { id: saved.id }, relations: { recordedBy: true } });
      return { order: found, observation: withUser, raised: flags };
    });

    const urgent = raised.filter((flag) => flag.severity === 'urgent');
    if (urgent.length > 0) {
      for (const to of [order.prescriber.email, order.patient.ward.nurseInChargeEmail]) this.mail.send(urgentFlagsMail(order, urgent, to));
    }
    const low = raised.find((flag) => flag.code === 'syringe.low');
    if (low) this.mail.send(syringeLowMail(order, low));
    this.events.publishForOrder(orderId, 'observation');
    return { ...toObservationResponse(observation), flags: raised };
  }

  async list(orderId: number): Promise<ObservationResponse[]> {
    await this.orders.load(this.dataSource.manager, orderId);
    const observations = await this.dataSource.manager.find(Observation, {
      where: { orderId },
      relations: { recordedBy: true },
      order: { at: 'ASC', id: 'ASC' },
    });
    return observations.map(toObservationResponse);
  }
}

/** The observation against its PCA's timeline, by the shared rule the form checks with too. */
async function checkTimeline(manager: EntityManager, order: PcaOrder, release: SyringeRelease, at: Date, dto: CreateObservationDto) {
  const where = { orderId: order.id, releaseId: release.id };
  const previous = await manager.findOne(Observation, { where: { ...where, at: LessThanOrEqual(at) }, order: { at: 'DESC', id: 'DESC' } });
  const next = await manager.findOne(Observation, { where: { ...where, at: MoreThan(at) }, order: { at: 'ASC', id: 'ASC' } });
  const errors = observationTimelineErrors({
    at,
    values: dto,
    before: previous,
    after: next,
    syringeVolumeMl: release.volumeMl,
    startedAt: order.startedAt,
    now: new Date(),
  });
  if (errors.length > 0) throw fieldErrors('The observation needs correcting', errors);
  return { previous };
}
