import type { AuditAction } from '@catline/contracts';
import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { InstantColumn } from '../columns.js';

/**
 * The audit trail, append-only: nothing in the API updates or deletes a row. The actor is kept by value
 * (no foreign key) so the record outlives the person and names whoever typed a failed sign-in.
 */
@Entity('audit_entries')
@Index('ix_audit_entries_action_at', ['action', 'at'])
@Index('ix_audit_entries_ship_at', ['shipId', 'at'])
export class AuditEntry {
  @PrimaryGeneratedColumn({ type: 'bigint' })
  id: string;

  @Index('ix_audit_entries_at')
  @InstantColumn({ default: () => 'CURRENT_TIMESTAMP(3)' })
  at: Date;

  @Column({ name: 'actor_id', type: 'int', nullable: true })
  actorId: number | null;

  @Column({ name: 'actor_email', type: 'varchar', length: 254, nullable: true })
  actorEmail: string | null;

  @Column({ name: 'actor_role', type: 'varchar', length: 20, nullable: true })
  actorRole: string | null;

  @Column({ name: 'client_address', type: 'varchar', length: 64, nullable: true })
  clientAddress: string | null;

  @Column({ type: 'varchar', length: 40 })
  action: AuditAction;

  @Column({ name: 'subject_type', type: 'varchar', length: 40 })
  subjectType: string;

  @Column({ name: 'subject_id', type: 'int', nullable: true })
  subjectId: number | null;

  /** The ship the subject belongs to: a ship's admin reads only their ship's entries (ship-scope.ts). */
  @Column({ name: 'ship_id', type: 'int', nullable: true })
  shipId: number | null;

  @Column({ length: 300 })
  summary: string;

  @Column({ type: 'json', nullable: true })
  before: Record<string, unknown> | null;

  @Column({ type: 'json', nullable: true })
  after: Record<string, unknown> | null;
}
