import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, Unique } from 'typeorm';
import type { Shift, SignoffRole } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** One nurse's confirmation of one PCA at a shift handover (outgoing, or incoming with a pump re-check). */
@Entity('handover_signoffs')
@Unique('UQ_handover_signoffs_once', ['orderId', 'shiftDate', 'shift', 'role'])
@Index('IDX_handover_signoffs_ward_shift', ['wardId', 'shiftDate', 'shift'])
export class HandoverSignoff {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer' })
  wardId: number;

  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  @Column({ type: 'varchar', length: 10 })
  shiftDate: string;

  @Column({ type: 'varchar', length: 8 })
  shift: Shift;

  @Column({ type: 'varchar', length: 10 })
  role: SignoffRole;

  @Column({ type: 'integer' })
  nurseId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'nurseId' })
  nurse: Relation<User>;

  /** The incoming nurse's re-check that the pump settings match the order. */
  @Column({ type: 'boolean', nullable: true })
  pumpSettingsMatch: boolean | null;

  @Column({ type: 'datetime' })
  at: Date;
}
