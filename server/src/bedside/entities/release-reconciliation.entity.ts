import { Column, Entity, JoinColumn, OneToOne, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { SyringeRelease } from '../../releases/entities/syringe-release.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** A finished syringe: dispensed against infused plus witnessed waste. One per release. */
@Entity('release_reconciliations')
export class ReleaseReconciliation {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer', unique: true })
  releaseId: number;

  @OneToOne(() => SyringeRelease, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'releaseId' })
  release: Relation<SyringeRelease>;

  @Column({ type: 'real' })
  dispensedMl: number;

  @Column({ type: 'real' })
  infusedMl: number;

  @Column({ type: 'real' })
  wastedMl: number;

  @Column({ type: 'real' })
  discrepancyMl: number;

  @Column({ type: 'boolean' })
  mustReport: boolean;

  @Column({ type: 'real' })
  toleranceMl: number;

  @Column({ type: 'integer' })
  recordedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'recordedById' })
  recordedBy: Relation<User>;

  /** The second nurse who watched the waste. */
  @Column({ type: 'integer' })
  witnessId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'witnessId' })
  witness: Relation<User>;

  @Column({ type: 'datetime' })
  at: Date;
}
