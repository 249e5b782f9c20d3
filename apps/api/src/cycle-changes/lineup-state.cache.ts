import type { LineupSnapshot } from '@catline/contracts';
import type { DataSource } from 'typeorm';
import { AircraftType } from '../database/entities/aircraft-type.entity.js';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { EntityWriteCounter } from '../database/entity-write-counter.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { Squadron } from '../database/entities/squadron.entity.js';
import { User } from '../database/entities/user.entity.js';
import type { LineupState } from './lineup-state.js';

/** What a cycle's lineup is computed from besides its own slots and row. */
const REFERENCE_ENTITIES: ReadonlySet<unknown> = new Set([Ship, Catapult, Aircraft, AircraftType, Squadron, User]);

/** Enough for every cycle a deck runs at once; the oldest entry goes first. */
const MAX_ENTRIES = 32;

/** What a command's writes change in a state it was given: slot versions and catapult statuses. */
const writesIn = (state: LineupState) =>
  `${state.cycle.version}|${state.slots.map((slot) => slot.version).join(',')}|${state.catapults.map((catapult) => catapult.status).join(',')}`;

/** The state a command starts from at the cycle's locked version, and its snapshot (the "before" of the change). */
export class StartingPoint {
  private readonly writes: string;

  constructor(
    readonly state: LineupState,
    readonly snapshot: LineupSnapshot,
    /** LineupStateCache.generation when the state was read. */
    readonly generation: number,
  ) {
    this.writes = writesIn(state);
  }

  get version(): number {
    return this.state.cycle.version;
  }

  /** True while no write has been applied to the state. */
  get untouched(): boolean {
    return writesIn(this.state) === this.writes;
  }
}

/**
 * The state and snapshot each cycle reached with its last change in this process, so that the next
 * command on the cycle starts from memory instead of five queries and their hydration while it holds
 * the cycle's lock. An entry serves only a command that finds the cycle at the entry's version (every
 * write to a cycle's row or slots goes through the change pipeline, which bumps it), and only while no
 * ship, catapult, aircraft, type, squadron or person has been written since it was read (an
 * EntityWriteCounter counts those writes).
 *
 * The counter sees this process's writes only: with several API processes (REDIS_URL) the cache is off.
 */
export class LineupStateCache {
  private readonly entries = new Map<number, StartingPoint>();
  private readonly referenceWrites?: EntityWriteCounter;

  constructor(dataSource: DataSource, enabled: boolean) {
    if (enabled) this.referenceWrites = new EntityWriteCounter(dataSource, REFERENCE_ENTITIES);
  }

  /** Counts writes to reference data; read it before loading a state that will be kept. */
  get generation(): number {
    return this.referenceWrites?.count ?? 0;
  }

  /**
   * The state the cycle's last change reached here, or undefined. It is handed over, not copied: the
   * command checks that the cycle is still at its version, changes it as it writes, and keep() or
   * handBack() puts it back.
   */
  take(cycleId: number): StartingPoint | undefined {
    const entry = this.entries.get(cycleId);
    if (!entry) return undefined;
    this.entries.delete(cycleId);
    return entry.generation === this.generation ? entry : undefined;
  }

  /**
   * Keeps the state a command reached, before its COMMIT (call forget() if that fails), unless reference
   * data was written since `generation` was read. Commands on a cycle hold its lock in turn, so the
   * last one kept is the newest.
   */
  keep(state: LineupState, snapshot: LineupSnapshot, generation: number): StartingPoint | undefined {
    return this.put(new StartingPoint(state, snapshot, generation));
  }

  /** Drops a kept state whose COMMIT failed (the rows may be as before it). */
  forget(entry: StartingPoint): void {
    if (this.entries.get(entry.state.cycle.id) === entry) this.entries.delete(entry.state.cycle.id);
  }

  /** Takes back where a failed command started, if it wrote nothing: its rollback left the rows as they were. */
  handBack(start: StartingPoint): void {
    if (start.untouched) this.put(start);
  }

  private put(entry: StartingPoint): StartingPoint | undefined {
    if (!this.referenceWrites || entry.generation !== this.generation) return undefined;
    const cycleId = entry.state.cycle.id;
    this.entries.delete(cycleId);
    this.entries.set(cycleId, entry);
    if (this.entries.size > MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value!);
    return entry;
  }
}
