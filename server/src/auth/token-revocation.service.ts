import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, LessThan } from 'typeorm';
import { recordAudit } from '../audit/record-audit.js';
import type { AuthUser } from './auth-user.js';
import { RevokedToken } from './entities/revoked-token.entity.js';

/** Signing out ends the session on the server too: its token is refused from then on. */
@Injectable()
export class TokenRevocationService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async revoke(user: AuthUser, session: { jti: string; expiresAt: Date }): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      // Two sign-outs of one session can both pass the guard; transactions run one at a time, so
      // the second finds the first's row and has nothing to do.
      if (await manager.existsBy(RevokedToken, { jti: session.jti })) return;
      // Rows of tokens that have expired anyway are of no more use.
      await manager.delete(RevokedToken, { expiresAt: LessThan(new Date()) });
      await manager.insert(RevokedToken, { jti: session.jti, userId: user.id, expiresAt: session.expiresAt });
      await recordAudit(manager, user, { action: 'user.sign-out', entityType: 'user', entityId: user.id, summary: {} });
    });
  }

  isRevoked(jti: string): Promise<boolean> {
    return this.dataSource.manager.existsBy(RevokedToken, { jti });
  }
}
