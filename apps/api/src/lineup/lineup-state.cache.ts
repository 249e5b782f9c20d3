import type { LineupSnapshot } from '@catline/contracts';
import type {
  DataSource,
  EntitySubscriberInterface,
  InsertEvent,
  QueryRunner,
  RemoveEvent,
  TransactionCommitEvent,
  UpdateEvent,
} from 'typeorm';
import { AircraftType } from '../aircraft-types/entities/aircraft-type.entity.js';
import { Aircraft } from '../aircraft/entities/aircraft.entity.js';
import type { Cycle } from '../cycles/entities/cycle.entity.js';
import { Catapult } from '../ships/entities/catapult.entity.js';
import { Ship } from '../ships/entities/ship.entity.js';
import { Squadron } from '../squadrons/entities/squadron.entity.js';
import { User } from '../users/entities/user.entity.js';
import type { LineupState } from './lineup-state.js';

/** What a cycle's lineup is computed from besides its own slots and row. */
const REFERENCE_ENTITIES: ReadonlySet<unknown> = new Set([Ship, Catapult, Aircraft, AircraftType, Squadron, User]);

/** Enough for every cycle a deck runs at once; the oldest entry goes first. */
const MAX_ENTRIES = 32;

const WROTE_REFERENCE = 'catline.wroteReferenceData';

export interface KeptState {
  version: number;
  generation: number;
  state: LineupState;
  snapshot: LineupSnapshot;
}

/** The state a command starts from, and the snapshot of it (the "before" of the change). */
export interface StartingPoint {
  state: LineupState;
  snapshot: LineupSnapshot;
}

/**
 * The state and snapshot each cycle reached with its last change in this process, so that the next
 * command on the cycle starts from memory instead of five queries and their hydration while it holds
 * the cycle's lock. An entry serves only a command that locked the cycle at the entry's version (every
 * write to a cycle's row or slots goes through the change pipeline, which bumps it), and only while no
 * ship, catapult, aircraft, type, squadron or person has been written since it was read: TypeORM's
 * entity events count those writes here (again when their transaction commits, so a load that read
 * between the write and its commit is not kept).
 *
 * Those events are this process's own: with several API processes (REDIS_URL) the cache is off.
 */
export class LineupStateCache implements EntitySubscriberInterface {
  private readonly entries = new Map<number, KeptState>();
  private written = 0;

  constructor(
    dataSource: DataSource,
    private readonly enabled: boolean,
  ) {
    if (enabled) dataSource.subscribers.push(this);
  }

  /** Counts writes to reference data; read it before loading a state that will be kept. */
  get generation(): number {
    return this.written;
  }

  /**
   * The state at the locked cycle's version, or undefined. It is handed over, not copied: the command
   * changes it as it writes, and keep() puts the result back (a command that fails leaves nothing).
   */
  take(locked: Cycle): StartingPoint | undefined {
    const entry = this.entries.get(locked.id);
    if (!entry) return undefined;
    this.entries.delete(locked.id);
    if (entry.version !== locked.version || entry.generation !== this.written) return undefined;
    return { state: { ...entry.state, cycle: locked }, snapshot: entry.snapshot };
  }

  /**
   * Keeps the state a command reached, before its COMMIT (call forget() if that fails), unless reference
   * data was written since `generation` was read. Commands on a cycle hold its lock in turn, so the
   * last one kept is the newest.
   */
  keep(state: LineupState, snapshot: LineupSnapshot, generation: number): KeptState | undefined {
    if (!this.enabled || generation !== this.written) return undefined;
    const entry: KeptState = { version: state.cycle.version, generation, state, snapshot };
    this.entries.delete(state.cycle.id);
    this.entries.set(state.cycle.id, entry);
    if (this.entries.size > MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value!);
    return entry;
  }

  /** Drops a kept state whose COMMIT failed (the rows may be as before it). */
  forget(entry: KeptState): void {
    if (this.entries.get(entry.state.cycle.id) === entry) this.entries.delete(entry.state.cycle.id);
  }

  afterInsert(event: InsertEvent<unknown>): void {
    this.noteWrite(event.metadata.target, event.queryRunner);
  }

  afterUpdate(event: UpdateEvent<unknown>): void {
    this.noteWrite(event.metadata.target, event.queryRunner);
  }

  afterRemove(event: RemoveEvent<unknown>): void {
    this.noteWrite(event.metadata.target, event.queryRunner);
  }

  afterTransactionCommit(event: TransactionCommitEvent): void {
    if (event.queryRunner.data[WROTE_REFERENCE] !== true) return;
    event.queryRunner.data[WROTE_REFERENCE] = false;
    this.written += 1;
  }

  private noteWrite(target: unknown, queryRunner: QueryRunner): void {
    if (!REFERENCE_ENTITIES.has(target)) return;
    this.written += 1;
    if (queryRunner.isTransactionActive) queryRunner.data[WROTE_REFERENCE] = true;
  }
}
