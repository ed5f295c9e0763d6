import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Consciousness, OxygenDevice, SedationLevel } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** A scheduled observation: the patient's state and the pump's cumulative totals for the running syringe. */
@Entity('observations')
@Index('IDX_observations_order_at', ['orderId', 'at'])
export class Observation {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  /** The syringe the pump totals belong to; totals restart with each syringe. */
  @Column({ type: 'integer' })
  releaseId: number;

  @ManyToOne(() => SyringeRelease, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'releaseId' })
  release: Relation<SyringeRelease>;

  @Column({ type: 'datetime' })
  at: Date;

  @Column({ type: 'integer' })
  painScore: number;

  @Column({ type: 'varchar', length: 2 })
  sedationLevel: SedationLevel;

  @Column({ type: 'integer' })
  respiratoryRate: number;

  @Column({ type: 'integer' })
  spo2: number;

  @Column({ type: 'integer' })
  attempts: number;

  @Column({ type: 'integer' })
  delivered: number;

  @Column({ type: 'real' })
  volumeInfusedMl: number;

  @Column({ type: 'real' })
  syringeRemainingMl: number;

  /** Litres per minute of supplemental oxygen; 0 is air; null when not recorded. */
  @Column({ type: 'real', nullable: true })
  oxygenLitresPerMinute: number | null;

  @Column({ type: 'varchar', length: 24, nullable: true })
  oxygenDevice: OxygenDevice | null;

  @Column({ type: 'integer', nullable: true })
  heartRate: number | null;

  @Column({ type: 'integer', nullable: true })
  systolicBp: number | null;

  @Column({ type: 'real', nullable: true })
  temperatureC: number | null;

  @Column({ type: 'varchar', length: 16, nullable: true })
  consciousness: Consciousness | null;

  @Column({ type: 'text', default: '' })
  note: string;

  @Column({ type: 'integer' })
  recordedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'recordedById' })
  recordedBy: Relation<User>;

  @CreateDateColumn()
  createdAt: Date;
}
