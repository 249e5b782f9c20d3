import type { ChangeActor, ChangeKind, LineupChange, LineupCommandResult } from '@catline/contracts';
import { epochMs, type EpochMs } from '@catline/launch-math';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager, type QueryDeepPartialEntity } from 'typeorm';
import { Cycle } from '../database/entities/cycle.entity.js';
import { LineupChangeFeed, type FeedTicket } from './change-feed.service.js';
import { toLineupChange } from './change.mapper.js';
import { Clock } from './clock.js';
import { isDeadlock, retryOnDeadlock } from './deadlock-retry.js';
import { bumpVersion, claimNextVersion } from './cycle-version.js';
import { CycleChange } from '../database/entities/cycle-change.entity.js';
import { diffSnapshots } from './lineup-diff.js';
import { buildSnapshot } from './lineup-snapshot.builder.js';
import { LineupStateCache, StartingPoint } from './lineup-state.cache.js';
import { LineupStateLoader, type LineupState } from './lineup-state.js';
import { asLaunchDataRefusal } from './lineup.exception.js';

/** What a command did, for the change log. */
export interface ChangeDraft {
  /** One line for people, e.g. "D33 moved to cat 2, place 3". */
  summary: string;
  /** The request as accepted, kept with the change. */
  command: Record<string, unknown>;
  /**
   * True when the step wrote only through slot-writes (or set what it wrote on `state` itself), so
   * `state` already equals the rows: the pipeline then skips reading the cycle again.
   */
  mirrored?: boolean;
}

/** A command already applied earlier (a repeated launch): answered with its original result, nothing written. */
export interface RepeatedCommand {
  repeatOf: LineupCommandResult;
}

/** Ends the transaction of a repeated command, rolled back, with the answer it had the first time. */
class RepeatedCommandAnswer extends Error {
  constructor(readonly result: LineupCommandResult) {
    super('repeated command');
  }
}

/** Checks the command's own basis against the locked state, writes its rows, and says what it did. */
export type ChangeStep = (manager: EntityManager, state: LineupState) => Promise<ChangeDraft | RepeatedCommand>;

/** A change that may follow in the same transaction (a cycle closing on its last launch); null when it does not apply. */
export interface FollowUp {
  kind: ChangeKind;
  step: (manager: EntityManager, state: LineupState) => Promise<ChangeDraft | null>;
}

/**
 * The one way a cycle changes: take the cycle row's lock and its next version in one statement, let the
 * command check its own basis and write, append the change (its patch is the difference of the
 * snapshots before and after) and commit; the change is published to the cycle's room only after the
 * commit. The state a command starts from is usually the one the cycle's last change left in memory
 * (LineupStateCache). A transaction that ends in a deadlock runs again, a few times (see deadlock-retry.ts).
 */
@Injectable()
export class CycleChangeService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly loader: LineupStateLoader,
    private readonly cache: LineupStateCache,
    private readonly feed: LineupChangeFeed,
    private readonly clock: Clock,
  ) {}

  async apply(
    cycleId: number,
    actor: ChangeActor,
    kind: ChangeKind,
    step: ChangeStep,
    followUp?: FollowUp,
  ): Promise<LineupCommandResult> {
    try {
      // A rerun checks the command's basis again on the rows as they are now.
      return await retryOnDeadlock(() => this.attempt(cycleId, actor, kind, step, followUp));
    } catch (error) {
      throw asLaunchDataRefusal(error);
    }
  }

  private async attempt(
    cycleId: number,
    actor: ChangeActor,
    kind: ChangeKind,
    step: ChangeStep,
    followUp?: FollowUp,
  ): Promise<LineupCommandResult> {
    let ticket: FeedTicket | undefined;
    let written = false;
    let start: StartingPoint | undefined;
    let kept: StartingPoint | undefined;
    let changes: LineupChange[];
    try {
      // The server's default isolation (REPEATABLE READ) without a SET statement per command: the first
      // statement takes the cycle's lock, so every later read sees all that committed before it.
      changes = await this.dataSource.transaction(async (manager) => {
        start = await this.claim(manager, cycleId);
        ticket = this.feed.reserve(cycleId, start.version + 1);
        // The snapshot was taken before the step: steps apply what they write to the state.
        let { state, snapshot: before } = start;
        const first = await step(manager, state);
        // Rolled back, not committed: the claim moved the version on.
        if ('repeatOf' in first) throw new RepeatedCommandAnswer(first.repeatOf);

        const recorded: LineupChange[] = [];
        const record = async (changeKind: ChangeKind, draft: ChangeDraft) => {
          // The first change has the version the claim took; a follow-up bumps it again.
          if (recorded.length === 0) state.cycle.version += 1;
          else await this.bumpFrom(manager, state.cycle);
          if (!draft.mirrored)
            state = await this.loader.load(manager, await manager.findOneByOrFail(Cycle, { id: cycleId }), state);
          const after = buildSnapshot(state, this.now());
          recorded.push(await this.append(manager, state, changeKind, actor, draft, diffSnapshots(before, after)));
          before = after;
        };
        await record(kind, first);
        if (followUp) {
          const next = await followUp.step(manager, state);
          if (next) await record(followUp.kind, next);
        }
        ticket.prepare(recorded);
        // Kept before the COMMIT: the next command on the cycle may hold its lock before this one hears back.
        kept = this.cache.keep(state, before, start.generation);
        written = true;
        return recorded;
      });
    } catch (error) {
      if (kept) this.cache.forget(kept);
      else if (start) this.cache.handBack(start);
      if (error instanceof RepeatedCommandAnswer) {
        ticket?.rolledBack();
        return error.result;
      }
      // Failing after every row was written means the COMMIT itself failed: it may have landed,
      // unless the server reports a deadlock (or a Galera certification failure), which rolled it back.
      if (written && !isDeadlock(error)) ticket?.uncertain();
      else ticket?.rolledBack();
      throw error;
    }
    ticket?.committed();
    return { version: changes[0].version, change: changes[0] };
  }

  /**
   * Takes the cycle's lock and its next version in one statement, then the state the command starts
   * from (one version back): the one kept here if it is at that version, else read.
   */
  private async claim(manager: EntityManager, cycleId: number): Promise<StartingPoint> {
    const next = await claimNextVersion(manager, cycleId);
    const generation = this.cache.generation;
    const kept = this.cache.take(cycleId);
    if (kept?.version === next - 1) return kept;
    const read = await this.loader.read(manager, cycleId);
    // Read after the claim; the row differs from the state before the change in its version only.
    read.cycle.version = next - 1;
    return new StartingPoint(read, buildSnapshot(read, this.now()), generation);
  }

  /** The moment a launching cycle's projection is re-based on. */
  private now(): EpochMs {
    return epochMs(this.clock.now().getTime());
  }

  private async bumpFrom(manager: EntityManager, cycle: Cycle): Promise<void> {
    if (!(await bumpVersion(manager, cycle.id, cycle.version))) {
      throw new Error(`Cycle ${cycle.id} moved past version ${cycle.version} while its row was locked`);
    }
    cycle.version += 1;
  }

  private async append(
    manager: EntityManager,
    state: LineupState,
    kind: ChangeKind,
    actor: ChangeActor,
    draft: ChangeDraft,
    patch: LineupChange['patch'],
  ): Promise<LineupChange> {
    const row = manager.create(CycleChange, {
      cycleId: state.cycle.id,
      version: state.cycle.version,
      actorId: actor.id,
      actorName: actor.name,
      actorRole: actor.role,
      at: this.clock.now(),
      kind,
      summary: draft.summary.slice(0, 300),
      payload: { command: draft.command, patch },
    });
    // One INSERT and nothing read back (save() reads the row again), while the cycle stays locked. The cast
    // only bridges TypeORM's deep-partial typing of the JSON payload column.
    await manager
      .createQueryBuilder()
      .insert()
      .into(CycleChange)
      .values(row as QueryDeepPartialEntity<CycleChange>)
      .updateEntity(false)
      .execute();
    return toLineupChange(row);
  }
}

/** The person behind a change, kept by value in the change log. */
export const actorOf = (user: { id: number; name: string; role: ChangeActor['role'] }): ChangeActor => ({
  id: user.id,
  name: user.name,
  role: user.role,
});
