import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { recordAudit } from '../audit/record-audit.js';
import { PasswordAttemptsService } from '../common/throttling/password-attempts.service.js';
import type { AuthUser } from './auth-user.js';
import { type Lockout } from '@lockstep/shared';

/** An admin's unlock of a username or address, audited like any other change. */
@Injectable()
export class LockoutsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly attempts: PasswordAttemptsService,
  ) {}

  list(): Lockout[] {
    return this.attempts.lockouts();
  }

  async unlock(kind: Lockout['kind'], key: string, admin: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      // The event first: if there was nothing to clear, throwing rolls it back.
      await recordAudit(manager, admin, {
        action: 'sign-in.unlock',
        entityType: 'sign-in',
        entityId: `${kind}:${key}`,
        summary: { kind, key },
      });
      if (!this.attempts.clear(kind, key)) throw new NotFoundException(`No wrong passwords are counted for the ${kind} ${key}`);
    });
  }
}
