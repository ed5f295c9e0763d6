import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
  type Relation,
  VersionColumn,
} from 'typeorm';
import type { DoseUnit, Finding, LimitRuleResponse, OrderStatus, Override, RegimenType } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { Patient } from '../../patients/entities/patient.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { OrderEvent } from './order-event.entity.js';

/** A signed PCA order. A changed regimen is a new row (version + 1) that supersedes the old one. */
@Entity('pca_orders')
@Index('IDX_pca_orders_status', ['status'])
@Index('IDX_pca_orders_prescriber', ['prescriberId'])
export class PcaOrder {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  patientId: number;

  @ManyToOne(() => Patient, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'patientId' })
  patient: Relation<Patient>;

  @Column({ type: 'integer' })
  prescriberId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'prescriberId' })
  prescriber: Relation<User>;

  @Column({ type: 'integer' })
  drugId: number;

  @ManyToOne(() => Drug, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'drugId' })
  drug: Relation<Drug>;

  @Column({ type: 'varchar', length: 24 })
  status: OrderStatus;

  @Column({ type: 'varchar', length: 16 })
  regimenType: RegimenType;

  @Column({ type: 'integer', default: 1 })
  version: number;

  @Column({ type: 'integer', nullable: true })
  supersedesId: number | null;

  @ManyToOne(() => PcaOrder, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'supersedesId' })
  supersedes: Relation<PcaOrder> | null;

  @Column({ type: 'real' })
  concentrationPerMl: number;

  @Column({ type: 'varchar', length: 8 })
  doseUnit: DoseUnit;

  @Column({ type: 'real', nullable: true })
  loadingDose: number | null;

  @Column({ type: 'real' })
  demandDose: number;

  @Column({ type: 'real' })
  lockoutMinutes: number;

  @Column({ type: 'real' })
  basalRatePerHour: number;

  @Column({ type: 'real', nullable: true })
  oneHourLimit: number | null;

  @Column({ type: 'real', nullable: true })
  fourHourLimit: number | null;

  @Column({ type: 'real', nullable: true })
  clinicianBolusDose: number | null;

  @Column({ type: 'text', default: '' })
  indication: string;

  /** ISO calendar date by which the prescriber reviews the PCA. */
  @Column({ type: 'varchar', length: 10 })
  reviewDate: string;

  /** The limit rule and findings as they stood when the prescriber signed. */
  @Column({ type: 'simple-json', nullable: true })
  ruleSnapshot: LimitRuleResponse | null;

  @Column({ type: 'simple-json' })
  findingsSnapshot: Finding[];

  @Column({ type: 'simple-json' })
  overrides: Override[];

  @Column({ type: 'datetime' })
  signedAt: Date;

  @Column({ type: 'integer', nullable: true })
  verifiedById: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'verifiedById' })
  verifiedBy: Relation<User> | null;

  @Column({ type: 'datetime', nullable: true })
  verifiedAt: Date | null;

  /** When the bedside check matched and the PCA started. */
  @Column({ type: 'datetime', nullable: true })
  startedAt: Date | null;

  @Column({ type: 'datetime' })
  statusChangedAt: Date;

  /** The why of the latest status change (pharmacist's query, rejection, cancellation…). */
  @Column({ type: 'text', nullable: true })
  statusReason: string | null;

  @CreateDateColumn()
  createdAt: Date;

  /** Optimistic lock: a write based on a stale read fails instead of overwriting. */
  @VersionColumn()
  rowVersion: number;

  @OneToMany(() => OrderEvent, (event) => event.order)
  events: Relation<OrderEvent>[];
}
