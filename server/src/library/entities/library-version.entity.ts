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
  Unique,
} from 'typeorm';
import type { LibraryStatus } from '@lockstep/shared';
import { User } from '../../users/entities/user.entity.js';
import { Ward } from '../../wards/entities/ward.entity.js';
import { LibraryVersionEvent } from './library-version-event.entity.js';
import { LimitRule } from './limit-rule.entity.js';

/**
 * One version of a ward's dose-limit library. The partial unique indexes let the database itself
 * refuse a second active version, or a second open (draft or awaiting approval) one, per ward.
 */
@Entity('library_versions')
@Unique('UQ_library_versions_ward_number', ['wardId', 'number'])
@Index('IDX_library_versions_one_active', ['wardId'], { unique: true, where: `"status" = 'active'` })
@Index('IDX_library_versions_one_open', ['wardId'], { unique: true, where: `"status" IN ('draft', 'pending_approval')` })
export class LibraryVersion {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'integer' })
  wardId: number;

  @ManyToOne(() => Ward, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'wardId' })
  ward: Ward;

  /** 1, 2, 3 … within the ward. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 20 })
  status: LibraryStatus;

  @Column({ type: 'text', default: '' })
  note: string;

  @Column({ type: 'integer' })
  authorId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'authorId' })
  author: User;

  @Column({ type: 'integer', nullable: true })
  approverId: number | null;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'approverId' })
  approver: User | null;

  @CreateDateColumn()
  createdAt: Date;

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  @Column({ type: 'datetime', nullable: true })
  approvedAt: Date | null;

  @Column({ type: 'datetime', nullable: true })
  retiredAt: Date | null;

  @OneToMany(() => LimitRule, (rule) => rule.version)
  rules: Relation<LimitRule>[];

  /** Who created, imported, edited, submitted or sent it back, and when. */
  @OneToMany(() => LibraryVersionEvent, (event) => event.version)
  events: Relation<LibraryVersionEvent>[];
}
