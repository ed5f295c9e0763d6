import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { FlagSeverity } from '@lockstep/shared';
import { Flag } from './entities/flag.entity.js';

export type NewFlag = { orderId: number; severity: FlagSeverity; code: string; message: string; action: string };

/** Raises flags inside the caller's transaction, so a flag exists exactly when its cause does. */
@Injectable()
export class FlagsService {
  async raise(manager: EntityManager, flag: NewFlag): Promise<Flag> {
    return manager.save(manager.create(Flag, { ...flag, raisedAt: new Date(), acknowledgedAt: null, acknowledgedById: null, acknowledgeNote: null }));
  }
}
