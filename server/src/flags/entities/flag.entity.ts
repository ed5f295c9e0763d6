import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { FlagSeverity } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** A warning Lockstep raised about an order. Open until someone acknowledges it with a note. */
@Entity('flags')
export class Flag {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  /** The syringe a flag is about, where it is about one (e.g. running low). */
  @Column({ type: 'integer', nullable: true })
  releaseId: number | null;

  /**
   * The observation that raised it, where one did: the monitoring schedule counts an urgent flag from the
   * reading's time, so a reading entered late is not given a fresh interval from the moment it was saved.
   */
  @Column({ type: 'integer', nullable: true })
  observationId: number | null;

  @Column({ type: 'varchar', length: 8 })
  severity: FlagSeverity;

  @Column({ type: 'varchar', length: 48 })
  code: string;

  @Column({ type: 'text' })
  message: string;

  /** What to do about it, in words a nurse or pharmacist can act on. */
  @Column({ type: 'text' })
  action: string;

  @Column({ type: 'datetime' })
  raisedAt: Date;

  @Column({ type: 'datetime', nullable: true })
  acknowledgedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  acknowledgedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'acknowledgedById' })
  acknowledgedBy: Relation<User> | null;

  @Column({ type: 'text', nullable: true })
  acknowledgeNote: string | null;
}
