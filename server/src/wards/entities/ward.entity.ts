import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity('wards')
export class Ward {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 16, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120 })
  specialty: string;

  /** Paediatric wards check doses per kg of body weight. */
  @Column({ type: 'boolean', default: false })
  weightBasedDosing: boolean;

  /** Where new orders awaiting verification and reconciliation alerts are e-mailed. */
  @Column({ type: 'varchar', length: 200, default: '' })
  pharmacyEmail: string;

  /** Where released syringes and urgent flags are e-mailed. */
  @Column({ type: 'varchar', length: 200, default: '' })
  nurseInChargeEmail: string;

  /** A finished syringe whose dispensed and accounted volumes differ by more than this is reported (local policy). */
  @Column({ type: 'real', default: 0.5 })
  reconciliationToleranceMl: number;
}
