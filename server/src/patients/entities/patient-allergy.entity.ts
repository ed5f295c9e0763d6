import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { AllergySeverity } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { Patient } from './patient.entity.js';

/**
 * One recorded allergy: a formulary drug (`drugId`, its generic name as the substance) or free
 * text, the reaction and its severity. Removing an entry deletes the row; the audit trail keeps it.
 */
@Entity('patient_allergies')
export class PatientAllergy {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  patientId: number;

  @ManyToOne(() => Patient, (patient) => patient.allergies, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'patientId' })
  patient: Relation<Patient>;

  /** The formulary drug, or null for free text (a drug not on the formulary, a food, latex…). */
  @Column({ type: 'integer', nullable: true })
  drugId: number | null;

  @ManyToOne(() => Drug, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'drugId' })
  drug: Drug | null;

  @Column({ type: 'varchar', length: 120 })
  substance: string;

  @Column({ type: 'varchar', length: 200 })
  reaction: string;

  @Column({ type: 'varchar', length: 12 })
  severity: AllergySeverity;

  /** Null for entries moved from the old free-text field, which did not say who wrote them or when. */
  @Column({ type: 'integer', nullable: true })
  recordedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'recordedById' })
  recordedBy: User | null;

  @Column({ type: 'datetime', nullable: true })
  recordedAt: Date | null;
}
