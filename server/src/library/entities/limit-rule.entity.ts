import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation, Unique } from 'typeorm';
import type { DoseUnit, Limits, RegimenField } from '@lockstep/shared';
import { Drug } from '../../drugs/entities/drug.entity.js';
import { LibraryVersion } from './library-version.entity.js';

/** One drug at one concentration in a library version, with limits per regimen parameter. */
@Entity('limit_rules')
@Unique('UQ_limit_rules_version_drug_concentration', ['versionId', 'drugId', 'concentrationPerMl'])
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

  /** Limits per parameter; read and written whole with the rule, never queried inside. */
  @Column({ type: 'simple-json' })
  limits: Partial<Record<RegimenField, Limits>>;
}
