import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Sex } from '@lockstep/shared';
import { Ward } from '../../wards/entities/ward.entity.js';

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

  @Column({ type: 'text', default: '' })
  allergies: string;

  @Column({ type: 'boolean', default: false })
  opioidTolerant: boolean;

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
