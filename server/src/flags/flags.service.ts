import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, IsNull } from 'typeorm';
import type { FlagResponse, FlagSeverity } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { toFlagResponse } from './dto/flag-response.js';
import { Flag } from './entities/flag.entity.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { recordAudit } from '../audit/record-audit.js';

export type NewFlag = {
  orderId: number;
  releaseId?: number | null;
  observationId?: number | null;
  severity: FlagSeverity;
  code: string;
  message: string;
  action: string;
};

@Injectable()
export class FlagsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly events: WardEventsService,
  ) {}

  /** Inside the caller's transaction, so a flag exists exactly when its cause does. */
  async raise(manager: EntityManager, flag: NewFlag): Promise<Flag> {
    return manager.save(
      manager.create(Flag, {
        releaseId: null,
        observationId: null,
        ...flag,
        raisedAt: new Date(),
        acknowledgedAt: null,
        acknowledgedById: null,
        acknowledgeNote: null,
      }),
    );
  }

  async acknowledge(id: number, note: string, user: AuthUser): Promise<FlagResponse> {
    const flag = await this.dataSource.transaction(async (manager) => {
      const flag = await manager.findOneBy(Flag, { id });
      if (!flag) throw new NotFoundException(`No flag with id ${id}`);
      const done = await manager.update(
        Flag,
        { id, acknowledgedAt: IsNull() },
        { acknowledgedAt: new Date(), acknowledgedById: user.id, acknowledgeNote: note.trim() },
      );
      if (done.affected !== 1) throw new ConflictException('This flag was already acknowledged');
      await recordAudit(manager, user, {
        action: 'order.flag-acknowledge',
        entityType: 'order',
        entityId: flag.orderId,
        summary: { flagId: id, code: flag.code, severity: flag.severity, note: note.trim() },
      });
      return manager.findOneOrFail(Flag, { where: { id }, relations: { acknowledgedBy: true } });
    });
    this.events.publishForOrder(flag.orderId, 'flag');
    return toFlagResponse(flag);
  }
}
