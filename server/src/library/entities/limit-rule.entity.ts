import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, Unique } from 'typeorm';
import type { DoseUnit, Limits, Population, RegimenField } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { LibraryVersion } from './library-version.entity.js';

/** One drug at one concentration for one population in a library version, with limits per regimen parameter. */
@Entity('limit_rules')
@Unique('UQ_limit_rules_version_drug_concentration_population', ['versionId', 'drugId', 'concentrationPerMl', 'populationKey'])
export class LimitRule {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  versionId: number;

  @ManyToOne(() => LibraryVersion, (version) => version.rules, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'versionId' })
  // Relation<> keeps the decorator metadata from touching the other class during ESM's circular import.
  version: Relation<LibraryVersion>;

  @Column({ type: 'integer' })
  drugId: number;

  @ManyToOne(() => Drug, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'drugId' })
  drug: Drug;

  @Column({ type: 'real' })
  concentrationPerMl: number;

  @Column({ type: 'varchar', length: 8 })
  doseUnit: DoseUnit;

  @Column({ type: 'boolean', default: false })
  perKg: boolean;

  /** Adult, or paediatric within the bands below (shared rule-population.ts); a null bound is open. */
  @Column({ type: 'varchar', length: 12, default: 'adult' })
  population: Population;

  @Column({ type: 'real', nullable: true })
  minAgeYears: number | null;

  @Column({ type: 'real', nullable: true })
  maxAgeYears: number | null;

  @Column({ type: 'real', nullable: true })
  minWeightKg: number | null;

  @Column({ type: 'real', nullable: true })
  maxWeightKg: number | null;

  /** shared populationKey(): 'adult' or the paediatric bands, so the database refuses two rules for one population. */
  @Column({ type: 'varchar', length: 80, default: 'adult' })
  populationKey: string;

  /** Limits per parameter; read and written whole with the rule, never queried inside. */
  @Column({ type: 'simple-json' })
  limits: Partial<Record<RegimenField, Limits>>;
}
