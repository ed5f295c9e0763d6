import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { LibraryContribution } from '@lockstep/shared';
import { User } from '../../users/entities/user.entity.js';
import { LibraryVersion } from './library-version.entity.js';

/** What a version's content owes to whom: created, imported, edited, submitted (none of them may approve it), or sent back. */
export type LibraryVersionEventKind = LibraryContribution | 'sent-back';

/**
 * One thing a pharmacist did to a library version, when. Contributions (created, imported,
 * edited, submitted) bar that pharmacist from approving it; a send-back carries the reviewer's
 * comment. Kept with the version and deleted with a discarded draft (the audit trail keeps both).
 */
@Entity('library_version_events')
export class LibraryVersionEvent {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  versionId: number;

  @ManyToOne(() => LibraryVersion, (version) => version.events, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'versionId' })
  version: Relation<LibraryVersion>;

  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId' })
  user: User;

  @Column({ type: 'varchar', length: 20 })
  kind: LibraryVersionEventKind;

  /** The reviewer's comment on a send-back; null otherwise. */
  @Column({ type: 'text', nullable: true })
  comment: string | null;

  @CreateDateColumn()
  at: Date;
}
