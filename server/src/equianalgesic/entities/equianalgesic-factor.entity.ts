import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique } from 'typeorm';
import type { DoseUnit, EquianalgesicRoute } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { User } from '../../users/entities/user.entity.js';

/**
 * One row of pharmacy's equianalgesic table, keyed by formulary drug id and route: `amount unit` of
 * the drug by that route is taken as equal to 10 mg parenteral morphine (see shared
 * drugs/equianalgesic.ts). The oral-morphine figure of a PCA reads its drug's row by id.
 */
@Entity('equianalgesic_factors')
@Unique('UQ_equianalgesic_factors_drug_route', ['drugId', 'route'])
export class EquianalgesicFactor {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer' })
  drugId: number;

  @ManyToOne(() => Drug, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'drugId' })
  drug: Drug;

  @Column({ type: 'varchar', length: 16 })
  route: EquianalgesicRoute;

  @Column({ type: 'real' })
  amount: number;

  @Column({ type: 'varchar', length: 8 })
  unit: DoseUnit;

  /** The published source, as pharmacy names it. */
  @Column({ type: 'text' })
  source: string;

  /** Who last changed it; null for the shipped default. */
  @Column({ type: 'integer', nullable: true })
  changedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'changedById' })
  changedBy: User | null;

  @Column({ type: 'datetime' })
  changedAt: Date;
}
