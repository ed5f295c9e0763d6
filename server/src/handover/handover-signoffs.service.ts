import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { shiftWindow, type HandoverSignoffResponse } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';
import type { CreateSignoffDto } from './dto/create-signoff.dto.js';
import { toSignoffResponse } from './dto/signoff-response.js';
import { HandoverSignoff } from './entities/handover-signoff.entity.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { fieldError } from '../common/errors/field-error.js';
import { recordAudit } from '../audit/record-audit.js';

/** Each PCA is confirmed at handover by the outgoing nurse and by a different, incoming nurse. */
@Injectable()
export class HandoverSignoffsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly events: WardEventsService,
  ) {}

  async signOff(wardId: number, dto: CreateSignoffDto, nurse: AuthUser, now = new Date()): Promise<HandoverSignoffResponse> {
    const saved = await this.dataSource.transaction(async (manager) => {
      const ward = await manager.findOneBy(Ward, { id: wardId });
      if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
      const order = await manager.findOne(PcaOrder, { where: { id: dto.orderId }, relations: { patient: true } });
      if (!order || order.patient.wardId !== wardId || order.status !== 'active') {
        throw fieldError('orderId', 'Only an active PCA on this ward is confirmed at handover');
      }
      if (dto.role === 'incoming' && dto.pumpSettingsMatch !== true) {
        throw fieldError(
          'pumpSettingsMatch',
          'Confirm the pump settings match the order; if they do not, stop and escalate before taking over',
        );
      }
      const { shift, shiftDate } = shiftWindow(now, ward.dayShiftStart, ward.nightShiftStart);
      const existing = await manager.find(HandoverSignoff, { where: { orderId: dto.orderId, shiftDate, shift } });
      if (existing.some((signoff) => signoff.role === dto.role))
        throw new ConflictException(`The ${dto.role} nurse has already confirmed this PCA for this shift`);
      if (existing.some((signoff) => signoff.nurseId === nurse.id))
        throw fieldError('role', 'The outgoing and incoming nurse are two different people');
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
      return manager.findOneOrFail(HandoverSignoff, { where: { id: created.id }, relations: { nurse: true } });
    });
    this.events.publishForOrder(dto.orderId, 'signoff');
    return toSignoffResponse(saved);
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
