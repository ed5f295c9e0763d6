import { ConflictException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, IsNull } from 'typeorm';
import {
  BEDSIDE_ROLES,
  compareSettings,
  formatDose,
  naloxoneWatch,
  naloxoneWatchSpan,
  naloxoneWatchUntil,
  pcaPaused,
  tallMan,
  type PcaPauseState,
  type PumpSettings,
  type SettingDifference,
  type WardPolicy,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { fieldError } from '../common/errors/field-error.js';
import { recordAudit } from '../audit/record-audit.js';
import { FlagsService } from '../flags/flags.service.js';
import { MailService, type OutgoingMail } from '../mail/mail.service.js';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { statusConflict } from '../orders/order-transitions.js';
import { OrdersService } from '../orders/orders.service.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { UsersService } from '../users/users.service.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { wardPolicy } from '../wards/ward-policy.js';
import { requireBedsideAction } from './bedside-state.js';
import type { NaloxoneDto, PauseDto, ResumeDto } from './dto/pause.dto.js';
import { PcaPause } from './entities/pca-pause.entity.js';

/** A clock a minute ahead of the server's is still "now"; further ahead is a typing slip. */
const CLOCK_SLACK_MS = 60_000;

/**
 * Pausing and resuming a running PCA, and naloxone given (which pauses it). A resume is a fresh
 * independent double-check: both nurses re-enter the pump settings and both must equal the order.
 */
@Injectable()
export class PausesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly users: UsersService,
    private readonly flags: FlagsService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  async state(orderId: number): Promise<PcaPauseState> {
    const order = await this.orders.load(this.dataSource.manager, orderId);
    return pauseState(this.dataSource.manager, order, []);
  }

  async naloxone(orderId: number, dto: NaloxoneDto, nurse: AuthUser): Promise<PcaPauseState> {
    await this.users.verifySignature(nurse.id, dto.signature.password);
    const { order, state } = await this.dataSource.transaction(async (manager) => {
      const order = await this.running(manager, orderId);
      const now = new Date();
      const givenAt = dto.givenAt ? new Date(dto.givenAt) : now;
      if (givenAt.getTime() > now.getTime() + CLOCK_SLACK_MS) throw fieldError('givenAt', 'Naloxone cannot be given in the future');
      if (order.startedAt && givenAt < order.startedAt) throw fieldError('givenAt', 'That is before this PCA started');
      const dose = formatDose(dto.dose, dto.doseUnit);
      const wasPaused = pcaPaused(await openPauses(manager, orderId));
      const pause = await manager.save(
        manager.create(PcaPause, {
          orderId,
          cause: 'naloxone',
          reason: `Naloxone ${dose} given`,
          pausedById: nurse.id,
          pausedAt: now,
          naloxoneDose: dto.dose,
          naloxoneUnit: dto.doseUnit,
          naloxoneGivenAt: givenAt,
          resumedAt: null,
          resumedById: null,
          resumeWitnessId: null,
          resumeReason: null,
        }),
      );
      const watch = naloxoneWatch(wardPolicy(order.patient.ward));
      const flag = await this.flags.raise(manager, {
        orderId,
        severity: 'urgent',
        code: 'naloxone.given',
        message: `Naloxone ${dose} given: PCA paused`,
        action: `Stay with the patient; observe every ${watch.everyMinutes} minutes for at least ${naloxoneWatchSpan(watch.forMinutes)}, as naloxone can wear off before the opioid; the prescriber reviews before the PCA resumes`,
      });
      await recordAudit(manager, nurse, {
        action: 'order.naloxone',
        entityType: 'order',
        entityId: orderId,
        summary: {
          pauseId: pause.id,
          dose: dto.dose,
          doseUnit: dto.doseUnit,
          givenAt: givenAt.toISOString(),
          flagId: flag.id,
          paused: wasPaused ? 'already paused' : { from: false, to: true },
        },
      });
      return { order, state: await pauseState(manager, order, []) };
    });
    this.mail.send(
      naloxoneMail(order, formatDose(dto.dose, dto.doseUnit), nurse.displayName, naloxoneWatch(wardPolicy(order.patient.ward))),
    );
    this.events.publishForOrder(orderId, 'flag');
    return state;
  }

  async pause(orderId: number, dto: PauseDto, nurse: AuthUser): Promise<PcaPauseState> {
    const state = await this.dataSource.transaction(async (manager) => {
      const order = await this.running(manager, orderId);
      if (pcaPaused(await openPauses(manager, orderId))) throw new ConflictException('This PCA is already paused');
      const pause = await manager.save(
        manager.create(PcaPause, {
          orderId,
          cause: 'nurse',
          reason: dto.reason.trim(),
          pausedById: nurse.id,
          pausedAt: new Date(),
          naloxoneDose: null,
          naloxoneUnit: null,
          naloxoneGivenAt: null,
          resumedAt: null,
          resumedById: null,
          resumeWitnessId: null,
          resumeReason: null,
        }),
      );
      await recordAudit(manager, nurse, {
        action: 'order.pause',
        entityType: 'order',
        entityId: orderId,
        summary: { pauseId: pause.id, reason: pause.reason, paused: { from: false, to: true } },
      });
      return pauseState(manager, order, []);
    });
    this.events.publishForOrder(orderId, 'order');
    return state;
  }

  async resume(orderId: number, dto: ResumeDto, nurse: AuthUser): Promise<PcaPauseState> {
    const witness = await this.users.verifyColleague(dto.witness.username, dto.witness.password, BEDSIDE_ROLES, nurse.id, 'witness');
    const state = await this.dataSource.transaction(async (manager) => {
      const order = await this.running(manager, orderId);
      const open = await openPauses(manager, orderId);
      if (open.length === 0) throw new ConflictException('This PCA is not paused');
      const release = await manager.findOneByOrFail(SyringeRelease, { orderId, status: 'in_use' });
      const differences = compareSettings(dto.settings, dto.witness.settings, orderedSettings(order, release));
      if (differences.length === 0) {
        const now = new Date();
        for (const pause of open) {
          const done = await manager.update(
            PcaPause,
            { id: pause.id, resumedAt: IsNull(), rowVersion: pause.rowVersion },
            {
              resumedAt: now,
              resumedById: nurse.id,
              resumeWitnessId: witness.id,
              resumeReason: dto.reason.trim(),
              rowVersion: pause.rowVersion + 1,
            },
          );
          if (done.affected !== 1) throw new ConflictException('This PCA was resumed by someone else a moment ago');
        }
      }
      await recordAudit(manager, nurse, {
        action: 'order.resume',
        entityType: 'order',
        entityId: orderId,
        summary: {
          pauseIds: open.map((pause) => pause.id),
          reason: dto.reason.trim(),
          witness: witness.displayName,
          result: differences.length === 0 ? 'resumed' : 'mismatch',
          ...(differences.length === 0 ? { paused: { from: true, to: false } } : { differences }),
        },
      });
      return pauseState(manager, order, differences);
    });
    if (state.differences.length === 0) this.events.publishForOrder(orderId, 'order');
    return state;
  }

  /** The order, refused unless it is active with a syringe running (the only time a pump can be paused). */
  private async running(manager: EntityManager, orderId: number): Promise<PcaOrder> {
    const order = await this.orders.load(manager, orderId);
    if (order.status !== 'active') throw statusConflict(order.status, 'active');
    await requireBedsideAction(manager, order, 'observe');
    return order;
  }
}

function openPauses(manager: EntityManager, orderId: number): Promise<PcaPause[]> {
  return manager.find(PcaPause, { where: { orderId, resumedAt: IsNull() } });
}

/** The order's pauses and the after-naloxone watch by its ward's policy. Expects the patient's ward loaded. */
async function pauseState(manager: EntityManager, order: PcaOrder, differences: SettingDifference[]): Promise<PcaPauseState> {
  const orderId = order.id;
  const policy: WardPolicy = wardPolicy(order.patient.ward);
  const pauses = await manager.find(PcaPause, {
    where: { orderId },
    relations: { pausedBy: true, resumedBy: true, resumeWitness: true },
    order: { pausedAt: 'DESC', id: 'DESC' },
  });
  const watchUntil = naloxoneWatchUntil(
    pauses.flatMap((pause) => (pause.naloxoneGivenAt ? [pause.naloxoneGivenAt] : [])),
    policy,
  );
  return {
    orderId,
    paused: pcaPaused(pauses),
    pauses: pauses.map((pause) => ({
      id: pause.id,
      cause: pause.cause,
      reason: pause.reason,
      pausedAt: pause.pausedAt.toISOString(),
      pausedByName: pause.pausedBy.displayName,
      naloxoneDose: pause.naloxoneDose,
      naloxoneUnit: pause.naloxoneUnit,
      naloxoneGivenAt: pause.naloxoneGivenAt?.toISOString() ?? null,
      resumedAt: pause.resumedAt?.toISOString() ?? null,
      resumedByName: pause.resumedBy?.displayName ?? null,
      resumeWitnessName: pause.resumeWitness?.displayName ?? null,
      resumeReason: pause.resumeReason,
    })),
    naloxoneWatchUntil: watchUntil?.toISOString() ?? null,
    naloxoneWatchEveryMinutes: naloxoneWatch(policy).everyMinutes,
    differences,
  };
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

// As with the other notices: bed and MRN, not the patient's name.
function naloxoneMail(order: PcaOrder, dose: string, nurseName: string, watch: { everyMinutes: number; forMinutes: number }): OutgoingMail {
  const where = `${order.patient.ward.name} bed ${order.patient.bed} (MRN ${order.patient.mrn})`;
  return {
    to: order.prescriber.email,
    subject: `URGENT: naloxone given, PCA paused — ${order.patient.ward.name} bed ${order.patient.bed}`,
    text: `${nurseName} gave naloxone ${dose} to the patient on the ${tallMan(order.drug.genericName)} PCA for ${where} (order ${order.id}). The PCA is paused.\n\nObservations every ${watch.everyMinutes} minutes for at least ${naloxoneWatchSpan(watch.forMinutes)}: naloxone can wear off before the opioid. Please review the patient and the regimen; the PCA resumes only after a two-nurse check of the pump settings.`,
  };
}
