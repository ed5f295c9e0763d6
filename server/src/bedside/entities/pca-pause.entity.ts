import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { NaloxoneUnit, PauseCause } from '@lockstep/shared';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { User } from '../../users/entities/user.entity.js';

/**
 * A pause of a running PCA, open until resumed. Each naloxone dose opens one of its own (even on a
 * PCA already paused), so the monitoring schedule reads naloxone times from here; a resume closes
 * every open pause.
 */
@Entity('pca_pauses')
export class PcaPause {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  @Column({ type: 'varchar', length: 16 })
  cause: PauseCause;

  @Column({ type: 'text' })
  reason: string;

  @Column({ type: 'integer' })
  pausedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'pausedById' })
  pausedBy: Relation<User>;

  @Column({ type: 'datetime' })
  pausedAt: Date;

  /** Naloxone given, with its unit and time (cause 'naloxone' only). */
  @Column({ type: 'real', nullable: true })
  naloxoneDose: number | null;

  @Column({ type: 'varchar', length: 8, nullable: true })
  naloxoneUnit: NaloxoneUnit | null;

  @Column({ type: 'datetime', nullable: true })
  naloxoneGivenAt: Date | null;

  @Column({ type: 'datetime', nullable: true })
  resumedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  resumedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'resumedById' })
  resumedBy: Relation<User> | null;

  /** The second nurse who re-entered the pump settings at the resume. */
  @Column({ type: 'integer', nullable: true })
  resumeWitnessId: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'resumeWitnessId' })
  resumeWitness: Relation<User> | null;

  @Column({ type: 'text', nullable: true })
  resumeReason: string | null;

  @Column({ type: 'integer', default: 0 })
  rowVersion: number;
}
