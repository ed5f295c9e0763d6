import { Column, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Sex, Spo2Scale } from '@lockstep/shared';
import { Ward } from '../../wards/entities/ward.entity.js';
import { PatientAllergy } from './patient-allergy.entity.js';

@Entity('patients')
export class Patient {
  @PrimaryGeneratedColumn()
  id: number;

  /** Medical record number: the hospital-wide patient identifier. */
  @Column({ type: 'varchar', length: 32, unique: true })
  mrn: string;

  @Column({ type: 'varchar', length: 80 })
  givenName: string;

  @Column({ type: 'varchar', length: 80 })
  familyName: string;

  /** ISO calendar date (yyyy-mm-dd); kept as text so no time zone can shift it. */
  @Column({ type: 'varchar', length: 10 })
  dateOfBirth: string;

  @Column({ type: 'varchar', length: 10 })
  sex: Sex;

  @Column({ type: 'real', nullable: true })
  weightKg: number | null;

  /** yyyy-mm-dd the weight was measured; null when not recorded. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  weightMeasuredOn: string | null;

  /** Load it (`relations: { allergies: true }`) wherever the order check runs: patientFactorsOf refuses a patient without it. */
  @OneToMany(() => PatientAllergy, (allergy) => allergy.patient)
  allergies: Relation<PatientAllergy>[];

  /** A clinician recorded "no known allergies"; false with no entries means nothing is recorded yet. */
  @Column({ type: 'boolean', default: false })
  noKnownAllergies: boolean;

  /** Follows the basis below (shared toleranceClaimProblem); true without one only on records from before bases were kept. */
  @Column({ type: 'boolean', default: false })
  opioidTolerant: boolean;

  /** The tolerance basis: oral morphine (or equianalgesic) mg a day, taken for `toleranceDays` days. */
  @Column({ type: 'real', nullable: true })
  toleranceOralMorphineMgPerDay: number | null;

  @Column({ type: 'integer', nullable: true })
  toleranceDays: number | null;

  /** NEWS2 SpO2 scale, chosen by a prescriber: '2' only for confirmed hypercapnic respiratory failure (RCP, NEWS2, 2017). */
  @Column({ type: 'varchar', length: 1, default: '1' })
  spo2Scale: Spo2Scale;

  @Column({ type: 'boolean', default: false })
  sleepApnoea: boolean;

  @Column({ type: 'boolean', default: false })
  otherSedatives: boolean;

  @Index()
  @Column({ type: 'integer' })
  wardId: number;

  @ManyToOne(() => Ward, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'wardId' })
  ward: Ward;

  @Column({ type: 'varchar', length: 16 })
  bed: string;
}
