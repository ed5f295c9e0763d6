import { ConflictException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Between, type DataSource, type EntityManager, IsNull, LessThan, LessThanOrEqual, MoreThan } from 'typeorm';
import {
  type FlagContext,
  type FlagDraft,
  isSedationOrBreathingFlag,
  observationFlags,
  type ObservationResponse,
  observationTimelineErrors,
  ORDER_STATUS_LABELS,
  oxygenErrors,
  type PreviousReading,
  type RecordedObservation,
  syringeStartReading,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { BedsideCheck } from '../bedside/entities/bedside-check.entity.js';
import { ClinicianBolus } from '../bedside/entities/clinician-bolus.entity.js';
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
import { vitalsPatientOf } from './vitals-patient.js';
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
    const oxygen = oxygenErrors(dto);
    if (oxygen.length > 0) throw fieldErrors('The observation needs correcting', oxygen);
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
      const inputs = await flagInputs(manager, found, release, at, previous);
      const drafts = observationFlags(
        { ...dto, at: at.toISOString() },
        inputs.previous,
        found.basalRatePerHour / found.concentrationPerMl,
        wardPolicy(found.patient.ward),
        { ...inputs.context, patient: vitalsPatientOf(found, at) },
      );
      const flags: (FlagDraft & { id: number })[] = [];
      for (const draft of drafts) {
        const oncePerSyringe = draft.code === 'syringe.low';
        if (oncePerSyringe && (await manager.existsBy(Flag, { orderId, releaseId: release.id, code: draft.code }))) continue;
        const flag = await this.flags.raise(manager, {
          ...draft,
          orderId,
          releaseId: oncePerSyringe ? release.id : null,
          observationId: saved.id,
        });
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
    return { ...toObservationResponse(observation, vitalsPatientOf(order, observation.at)), flags: raised };
  }

  async list(orderId: number): Promise<ObservationResponse[]> {
    const order = await this.orders.load(this.dataSource.manager, orderId);
    const observations = await this.dataSource.manager.find(Observation, {
      where: { orderId },
      relations: { recordedBy: true },
      order: { at: 'ASC', id: 'ASC' },
    });
    return observations.map((observation) => toObservationResponse(observation, vitalsPatientOf(order, observation.at)));
  }
}

const FOUR_HOURS_MS = 4 * 3_600_000;

/**
 * What the flags are worked out from besides the reading: the previous reading of this syringe, or
 * its start (the matched bedside check: 0 delivered, 0 mL infused) for the first one; the order's
 * regimen with this syringe's readings of the last 4 hours for its limits; clinician boluses
 * since the previous reading (volume the doses do not explain); whether an urgent sedation or
 * breathing flag is still open (the pain flag then never invites more opioid).
 */
async function flagInputs(
  manager: EntityManager,
  order: PcaOrder,
  release: SyringeRelease,
  at: Date,
  previous: Observation | null,
): Promise<{ previous: PreviousReading | null; context: FlagContext }> {
  const check = await manager.findOne(BedsideCheck, {
    where: { orderId: order.id, releaseId: release.id, status: 'matched' },
    order: { id: 'DESC' },
  });
  const startedAt = check?.secondAt ?? null;
  const start = startedAt && startedAt.getTime() <= at.getTime() ? syringeStartReading(startedAt.toISOString()) : null;
  const reading = (o: Observation): PreviousReading => ({
    at: o.at.toISOString(),
    attempts: o.attempts,
    delivered: o.delivered,
    volumeInfusedMl: o.volumeInfusedMl,
  });
  const windowStart = new Date(at.getTime() - FOUR_HOURS_MS);
  const recent = await manager.find(Observation, {
    where: { orderId: order.id, releaseId: release.id, at: Between(windowStart, at) },
    order: { at: 'ASC', id: 'ASC' },
  });
  const earlier = [...(start ? [start] : []), ...recent.map(reading)];
  const since = previous?.at ?? startedAt;
  const boluses = since ? await manager.findBy(ClinicianBolus, { orderId: order.id, at: Between(since, at) }) : [];
  // The loading dose goes in through the pump at the first start: it explains volume on the first reading.
  const firstStart =
    check !== null && !(await manager.existsBy(BedsideCheck, { orderId: order.id, status: 'matched', id: LessThan(check.id) }));
  const loadingMl = !previous && firstStart && order.loadingDose ? order.loadingDose / order.concentrationPerMl : 0;
  const openUrgent = await manager.findBy(Flag, { orderId: order.id, severity: 'urgent', acknowledgedAt: IsNull() });
  return {
    previous: previous ? reading(previous) : start,
    context: {
      regimen: order,
      earlier,
      otherMlSincePrevious: boluses.reduce((ml, bolus) => ml + bolus.amount / order.concentrationPerMl, loadingMl),
      syringeVolumeMl: release.volumeMl,
      urgentBreathingOpen: openUrgent.some((flag) => isSedationOrBreathingFlag(flag.code)),
    },
  };
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
