import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { IsNull, type DataSource } from 'typeorm';
import {
  handoverConfirmRefusal,
  handoverSettingsMismatches,
  shiftWindow,
  type HandoverSignoffResponse,
  type PumpSettings,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { Flag } from '../flags/entities/flag.entity.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../releases/entities/syringe-release.entity.js';
import { UsersService } from '../users/users.service.js';
import { Ward } from '../wards/entities/ward.entity.js';
import type { CreateSignoffDto } from './dto/create-signoff.dto.js';
import { toSignoffResponse } from './dto/signoff-response.js';
import { HandoverSignoff } from './entities/handover-signoff.entity.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { fieldError } from '../common/errors/field-error.js';
import { recordAudit } from '../audit/record-audit.js';

type Mismatches = ReturnType<typeof handoverSettingsMismatches>;

/**
 * Each PCA is confirmed at handover by the outgoing nurse and by a different, incoming nurse, each
 * signing with their password. The incoming nurse re-enters the pump's settings blind; they must
 * equal the running order. No PCA is confirmed while an urgent flag on it is open.
 */
@Injectable()
export class HandoverSignoffsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
    private readonly events: WardEventsService,
  ) {}

  async signOff(wardId: number, dto: CreateSignoffDto, nurse: AuthUser, now = new Date()): Promise<HandoverSignoffResponse> {
    await this.users.verifySignature(nurse.id, dto.signature.password);
    const outcome = await this.dataSource.transaction(async (manager) => {
      const ward = await manager.findOneBy(Ward, { id: wardId });
      if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
      const order = await manager.findOne(PcaOrder, { where: { id: dto.orderId }, relations: { patient: true } });
      if (!order || order.patient.wardId !== wardId || order.status !== 'active') {
        throw fieldError('orderId', 'Only an active PCA on this ward is confirmed at handover');
      }
      const settings = dto.settings ?? null;
      if (dto.role === 'incoming' && settings === null) {
        throw fieldError('settings', 'Enter the pump’s settings as you read them off the pump before you take this PCA over');
      }
      if (dto.role === 'outgoing' && settings !== null) {
        throw fieldError('settings', 'Only the incoming nurse re-enters the pump’s settings');
      }
      const openFlags = await manager.find(Flag, { where: { orderId: dto.orderId, acknowledgedAt: IsNull() }, order: { id: 'ASC' } });
      const refusal = handoverConfirmRefusal(openFlags);
      if (refusal) {
        const urgent = openFlags.filter((flag) => flag.severity === 'urgent');
        throw new ConflictException({
          statusCode: 409,
          message: refusal,
          openUrgentFlags: urgent.map((flag) => ({ id: flag.id, code: flag.code, message: flag.message })),
        });
      }
      const { shift, shiftDate } = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
      const existing = await manager.find(HandoverSignoff, { where: { orderId: dto.orderId, shiftDate, shift } });
      if (existing.some((signoff) => signoff.role === dto.role))
        throw new ConflictException(`The ${dto.role} nurse has already confirmed this PCA for this shift`);
      if (existing.some((signoff) => signoff.nurseId === nurse.id))
        throw fieldError('role', 'The outgoing and incoming nurse are two different people');

      if (settings !== null) {
        const release = await manager.findOneBy(SyringeRelease, { orderId: order.id, status: 'in_use' });
        if (!release) throw new ConflictException('No syringe is running on this PCA: finish the syringe change before handover');
        const mismatches = handoverSettingsMismatches(settings, orderedSettings(order, release));
        if (mismatches.length > 0) {
          // The refusal is on the record: a pump found wrong at handover is a finding, not just a typing error.
          await recordAudit(manager, nurse, {
            action: 'order.handover-signoff',
            entityType: 'order',
            entityId: dto.orderId,
            summary: { wardId, shiftDate, shift, role: dto.role, result: 'mismatch', differs: mismatches.map((m) => m.field) },
          });
          return { kind: 'mismatch', mismatches } as const;
        }
      }
      const created = await manager.save(
        manager.create(HandoverSignoff, {
          wardId,
          orderId: dto.orderId,
          shiftDate,
          shift,
          role: dto.role,
          nurseId: nurse.id,
          pumpSettingsMatch: dto.role === 'incoming' ? true : null,
          at: now,
        }),
      );
      await recordAudit(manager, nurse, {
        action: 'order.handover-signoff',
        entityType: 'order',
        entityId: dto.orderId,
        summary: {
          signoffId: created.id,
          wardId,
          shiftDate,
          shift,
          role: dto.role,
          ...(dto.role === 'incoming' ? { pumpSettingsMatch: true } : {}),
        },
      });
      return {
        kind: 'signed',
        saved: await manager.findOneOrFail(HandoverSignoff, { where: { id: created.id }, relations: { nurse: true } }),
      } as const;
    });
    if (outcome.kind === 'mismatch') throw mismatchRefusal(outcome.mismatches);
    this.events.publishForOrder(dto.orderId, 'signoff');
    return toSignoffResponse(outcome.saved);
  }

  async list(wardId: number, now = new Date()): Promise<HandoverSignoffResponse[]> {
    const ward = await this.dataSource.manager.findOneBy(Ward, { id: wardId });
    if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
    const { shift, shiftDate } = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
    const signoffs = await this.dataSource.manager.find(HandoverSignoff, {
      where: { wardId, shiftDate, shift },
      relations: { nurse: true },
      order: { id: 'ASC' },
    });
    return signoffs.map(toSignoffResponse);
  }
}

/** A 409 naming each setting the pump differs in, beside its field (`settings.<field>`). */
function mismatchRefusal(mismatches: Mismatches): ConflictException {
  return new ConflictException({
    statusCode: 409,
    message:
      'The pump’s settings differ from the running order: not signed. Do not take over; check the pump with the outgoing nurse and escalate.',
    errors: mismatches.map(({ field, message }) => ({ field: `settings.${field}`, message })),
  });
}

/** What the pump should hold: the running order and its running syringe (as the bedside check reads them). */
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
