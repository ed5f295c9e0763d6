import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, VersionColumn } from 'typeorm';
import type { ReleaseStatus } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** A prepared, labelled syringe that pharmacy hands over for one order. */
@Entity('syringe_releases')
export class SyringeRelease {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  @Column({ type: 'varchar', length: 12, unique: true })
  releaseCode: string;

  @Column({ type: 'varchar', length: 12 })
  status: ReleaseStatus;

  @Column({ type: 'real' })
  concentrationPerMl: number;

  @Column({ type: 'real' })
  volumeMl: number;

  @Column({ type: 'varchar', length: 40 })
  batch: string;

  @Column({ type: 'datetime' })
  expiresAt: Date;

  @Column({ type: 'varchar', length: 120 })
  preparedBy: string;

  @Column({ type: 'varchar', length: 120 })
  checkedBy: string;

  @Column({ type: 'text', nullable: true })
  overrideReason: string | null;

  @Column({ type: 'integer' })
  releasedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'releasedById' })
  releasedBy: Relation<User>;

  @Column({ type: 'datetime' })
  releasedAt: Date;

  @VersionColumn()
  rowVersion: number;
}
