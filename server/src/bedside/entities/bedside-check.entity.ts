import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, VersionColumn } from 'typeorm';
import type { CheckStatus, PumpSettings, SettingDifference } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** One two-nurse check of the pump against the order, for a start or a new syringe. */
@Entity('bedside_checks')
export class BedsideCheck {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  @Column({ type: 'integer' })
  releaseId: number;

  @ManyToOne(() => SyringeRelease, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'releaseId' })
  release: Relation<SyringeRelease>;

  @Column({ type: 'varchar', length: 16 })
  status: CheckStatus;

  @Column({ type: 'integer' })
  firstNurseId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'firstNurseId' })
  firstNurse: Relation<User>;

  /** Never sent back to a client: the second nurse must not see it. */
  @Column({ type: 'simple-json' })
  firstSettings: PumpSettings;

  @Column({ type: 'datetime' })
  firstAt: Date;

  @Column({ type: 'integer', nullable: true })
  secondNurseId: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'secondNurseId' })
  secondNurse: Relation<User> | null;

  @Column({ type: 'simple-json', nullable: true })
  secondSettings: PumpSettings | null;

  @Column({ type: 'datetime', nullable: true })
  secondAt: Date | null;

  @Column({ type: 'simple-json', nullable: true })
  differences: SettingDifference[] | null;

  @VersionColumn()
  rowVersion: number;
}
