import { DEFAULT_WARD_POLICY, type Population } from '@lockstep/shared';
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

  /** Who the ward cares for: a paediatric ward's observations use the children's bands (shared breathing-flags.ts). */
  @Column({ type: 'varchar', length: 12, default: 'adult' })
  population: Population;

  /** Where new orders awaiting verification and reconciliation alerts are e-mailed. */
  @Column({ type: 'varchar', length: 200, default: '' })
  pharmacyEmail: string;

  /** Where released syringes and urgent flags are e-mailed. */
  @Column({ type: 'varchar', length: 200, default: '' })
  nurseInChargeEmail: string;

  /** A finished syringe whose dispensed and accounted volumes differ by more than this is reported (local policy). */
  @Column({ type: 'real', default: 0.5 })
  reconciliationToleranceMl: number;

  // Monitoring policy: local settings; defaults and their sources in shared DEFAULT_WARD_POLICY.
  @Column({ type: 'integer', default: 60 })
  observationIntervalFirst24hMinutes: number;

  @Column({ type: 'integer', default: 120 })
  observationIntervalMinutes: number;

  /** Close observation: its interval, how long it lasts after a start or change, and after naloxone (shared DEFAULT_WARD_POLICY, WARD_POLICY_FLOORS). */
  @Column({ type: 'integer', default: DEFAULT_WARD_POLICY.closeObservationIntervalMinutes })
  closeObservationIntervalMinutes: number;

  @Column({ type: 'integer', default: DEFAULT_WARD_POLICY.closeObservationPeriodMinutes })
  closeObservationPeriodMinutes: number;

  @Column({ type: 'integer', default: DEFAULT_WARD_POLICY.naloxoneClosePeriodMinutes })
  naloxoneClosePeriodMinutes: number;

  // The column defaults (8, 90) predate the floors; a new ward takes the shipped defaults (urgent at
  // RR <= 8 and SpO2 <= 91 %, NEWS2, Royal College of Physicians 2017) from these initialisers instead.
  @Column({ type: 'integer', default: 8 })
  respiratoryRateThreshold: number = DEFAULT_WARD_POLICY.respiratoryRateThreshold;

  @Column({ type: 'integer', default: 90 })
  spo2Threshold: number = DEFAULT_WARD_POLICY.spo2Threshold;

  @Column({ type: 'real', default: 2 })
  syringeLowThresholdHours: number;

  @Column({ type: 'integer', default: 7 })
  painNotControlledScore: number;

  @Column({ type: 'real', default: 2 })
  painNotControlledRatio: number;

  /** A weight older than this many days is a caution on a weight-based or child's order (shared DEFAULT_WARD_POLICY). */
  @Column({ type: 'integer', default: 7 })
  weightMaxAgeDays: number;

  /** Ward-local clock times ("07:00") at which the day and night shifts start. */
  @Column({ type: 'varchar', length: 5, default: '07:00' })
  dayShiftStart: string;

  @Column({ type: 'varchar', length: 5, default: '19:00' })
  nightShiftStart: string;
}
