import type { ChangeKind, LineupPatch, Role } from '@catline/contracts';
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { Cycle } from './cycle.entity.js';
import { InstantColumn } from '../columns.js';

/** What a change was asked to do, and what it changed in the lineup. */
export interface CycleChangePayload {
  command: Record<string, unknown>;
  patch: LineupPatch;
}

/** The cycle change log: one row per accepted change, in version order. */
@Entity('cycle_changes')
@Unique('uq_cycle_changes_version', ['cycleId', 'version'])
export class CycleChange {
  @PrimaryGeneratedColumn({ type: 'bigint' })
  id: string;

  @Column({ name: 'cycle_id' })
  cycleId: number;

  @ManyToOne(() => Cycle, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cycle_id' })
  cycle: Relation<Cycle>;

  @Column()
  version: number;

  /** Kept by value as well, so the record survives the person's removal. */
  @Column({ name: 'actor_id' })
  actorId: number;

  @Column({ name: 'actor_name', length: 120 })
  actorName: string;

  @Column({ name: 'actor_role', type: 'varchar', length: 20 })
  actorRole: Role;

  @InstantColumn({ default: () => 'CURRENT_TIMESTAMP(3)' })
  at: Date;

  @Column({ type: 'varchar', length: 24 })
  kind: ChangeKind;

  @Column({ length: 300 })
  summary: string;

  @Column({ type: 'json' })
  payload: CycleChangePayload;
}
