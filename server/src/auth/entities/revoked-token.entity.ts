import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * A session ended by signing out before its token expired. Tokens are otherwise stateless, so
 * this list is what makes a copied token useless after its owner signs out. A row is needed only
 * until the token would have expired anyway; sign-outs clear the expired rows.
 */
@Entity('revoked_tokens')
export class RevokedToken {
  /** The token's `jti`. */
  @PrimaryColumn({ type: 'varchar', length: 36 })
  jti: string;

  @Column({ type: 'integer' })
  userId: number;

  @Index('IDX_revoked_tokens_expires')
  @Column({ type: 'datetime' })
  expiresAt: Date;
}
