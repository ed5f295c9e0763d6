import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { WardPolicyChangeStatus } from '@lockstep/shared';
import { User } from '../../users/entities/user.entity.js';
import { Ward } from './ward.entity.js';

/** One clinical setting of a proposed change: its value on the ward when proposed, and the value proposed. */
export type WardPolicySettingChange = { field: string; from: number; to: number };

/**
 * A change to a ward's clinical settings, proposed by an admin (signed) and applied only when a charge nurse
 * or a pharmacist, not the proposer, signs it off (shared `wardPolicyApprovalRefusal`). At most one is pending
 * per ward.
 */
@Entity('ward_policy_changes')
export class WardPolicyChange {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  wardId: number;

  @ManyToOne(() => Ward, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'wardId' })
  ward: Relation<Ward>;

  @Column({ type: 'varchar', length: 16 })
  status: WardPolicyChangeStatus;

  /** Each setting changed, from its value when proposed to the value proposed, as JSON. */
  @Column({ type: 'simple-json' })
  settings: WardPolicySettingChange[];

  @Column({ type: 'text' })
  reason: string;

  @Column({ type: 'integer' })
  proposedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'proposedById' })
  proposedBy: Relation<User>;

  @Column({ type: 'datetime' })
  proposedAt: Date;

  /** The proposal's Idempotency-Key: the same proposer sending the same key again gets this change back. */
  @Column({ type: 'varchar', length: 200, nullable: true })
  idempotencyKey: string | null;

  /** Who signed it off or declined it, and when. */
  @Column({ type: 'integer', nullable: true })
  decidedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'decidedById' })
  decidedBy: Relation<User> | null;

  @Column({ type: 'datetime', nullable: true })
  decidedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  declineReason: string | null;
}
