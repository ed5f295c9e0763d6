import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { PcaOrder } from '../../orders/entities/pca-order.entity.js';
import { User } from '../../users/entities/user.entity.js';

/** A nurse-given bolus within the order, co-signed by a second nurse. Counts toward usage. */
@Entity('clinician_boluses')
export class ClinicianBolus {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  /** In the order's dose unit. */
  @Column({ type: 'real' })
  amount: number;

  @Column({ type: 'text' })
  reason: string;

  @Column({ type: 'text', nullable: true })
  overrideReason: string | null;

  @Column({ type: 'integer' })
  givenById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'givenById' })
  givenBy: Relation<User>;

  @Column({ type: 'integer' })
  witnessId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'witnessId' })
  witness: Relation<User>;

  @Column({ type: 'datetime' })
  at: Date;
}
