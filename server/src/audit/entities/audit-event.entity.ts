import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { AuditEntityType } from '@lockstep/shared';

/**
 * One append-only, hash-chained record of a change. The id is assigned in sequence by the writer
 * (not by SQLite) because it is part of the hashed content; triggers refuse UPDATE and DELETE.
 */
@Entity('audit_event')
@Index(['entityType', 'entityId'])
@Index(['userId'])
@Index(['at'])
export class AuditEvent {
  @PrimaryColumn('integer')
  id!: number;

  /** ISO 8601 in UTC, kept as text so the hashed value is exactly what is stored. */
  @Column('varchar', { length: 30 })
  at!: string;

  @Column('integer', { nullable: true })
  userId!: number | null;

  /** The user's name at the time, so the record reads correctly after renames. */
  @Column('varchar', { length: 120, nullable: true })
  actorName!: string | null;

  @Column('varchar', { length: 60 })
  action!: string;

  @Column('varchar', { length: 30 })
  entityType!: AuditEntityType;

  @Column('varchar', { length: 64 })
  entityId!: string;

  /** Canonical JSON (RFC 8785) of what changed. */
  @Column('text')
  summary!: string;

  @Column('varchar', { length: 64 })
  prevHash!: string;

  @Column('varchar', { length: 64 })
  hash!: string;
}
