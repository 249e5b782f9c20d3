import type { LineupChange, LineupSnapshot } from './lineup.js';
import { applyLineupPatch } from './lineup-patch.js';

/**
 * What a client following one cycle holds. Every client (the web app, the test followers) keeps
 * its lineup through the functions below, so the rule is written once:
 * - apply the change whose version is the one held + 1, each once, in version order;
 * - ignore a change whose version is already held;
 * - keep a change that arrives early until the ones before it are applied;
 * - on a gap, join the cycle again with `sinceVersion` = the version held; one join at a time, so
 *   none while a join is under way, and again after its answer while a change is still missing.
 */
export interface CycleFollow {
  /** The lineup at the last version applied; null until the first snapshot. */
  readonly held: LineupSnapshot | null;
  /** Changes ahead of the next version, in version order, each version once. */
  readonly early: readonly LineupChange[];
  /** A join was sent and is not answered yet. */
  readonly joining: boolean;
}

export interface FollowStep {
  readonly follow: CycleFollow;
  /** The changes this step applied, in version order. */
  readonly applied: readonly LineupChange[];
  /** Set when the caller must join the cycle again, with this as `sinceVersion` (the join counts as sent). */
  readonly rejoinFrom: number | null;
}

/** What a client holds before its first join answers (or after a fresh HTTP read, `held`). */
export function startFollow(held: LineupSnapshot | null = null): CycleFollow {
  return { held, early: [], joining: false };
}

/** The client sends a join (its first, after a reconnect, or a rejoin it was asked for). */
export function followJoinAsked(follow: CycleFollow): CycleFollow {
  return { ...follow, joining: true };
}

/** Takes one change from the broadcast, a command's answer or a replay. */
export function followChange(follow: CycleFollow, change: LineupChange): FollowStep {
  const { follow: next, applied } = absorb(follow, change);
  return settle(next, applied);
}

/** Takes a whole snapshot (a join's answer or an HTTP read) unless the one held is newer. */
export function followSnapshot(follow: CycleFollow, snapshot: LineupSnapshot): FollowStep {
  const held = follow.held && follow.held.version > snapshot.version ? follow.held : snapshot;
  const { follow: next, applied } = catchUp({ ...follow, held });
  return settle(next, applied);
}

/** A join answered (`snapshot` or `replay`): the join is over. */
export function followJoin(
  follow: CycleFollow,
  answer: { mode: 'snapshot'; snapshot: LineupSnapshot } | { mode: 'replay'; changes: readonly LineupChange[] },
): FollowStep {
  const answered = { ...follow, joining: false };
  if (answer.mode === 'snapshot') return followSnapshot(answered, answer.snapshot);
  let replayed = answered;
  const applied: LineupChange[] = [];
  for (const change of answer.changes) {
    const absorbed = absorb(replayed, change);
    replayed = absorbed.follow;
    applied.push(...absorbed.applied);
  }
  return settle(replayed, applied);
}

/** A join unanswered: a rejoin is asked for if a change is still missing. */
export function followJoinFailed(follow: CycleFollow): FollowStep {
  return settle({ ...follow, joining: false }, []);
}

/** True while a change the client has seen announced is not applied yet. */
export function isBehind(follow: CycleFollow): boolean {
  return follow.early.length > 0;
}

interface Absorbed {
  follow: CycleFollow;
  applied: LineupChange[];
}

/** Adds one change to those waiting and applies what now follows the version held. */
function absorb(follow: CycleFollow, change: LineupChange): Absorbed {
  if (follow.held && change.version <= follow.held.version) return { follow, applied: [] };
  if (follow.early.some((waiting) => waiting.version === change.version)) return { follow, applied: [] };
  const early = [...follow.early, change].sort((a, b) => a.version - b.version);
  return catchUp({ ...follow, early });
}

function catchUp(follow: CycleFollow): Absorbed {
  if (!follow.held) return { follow, applied: [] };
  let held = follow.held;
  const applied: LineupChange[] = [];
  const early: LineupChange[] = [];
  for (const change of follow.early) {
    if (change.version <= held.version) continue;
    if (change.version === held.version + 1) {
      held = applyLineupPatch(held, change.version, change.patch);
      applied.push(change);
    } else {
      early.push(change);
    }
  }
  return { follow: { ...follow, held, early }, applied };
}

/** Asks for a rejoin when a change is missing and no join is under way; a client not yet joined waits for its first. */
function settle(follow: CycleFollow, applied: readonly LineupChange[]): FollowStep {
  if (!follow.held || follow.joining || follow.early.length === 0) return { follow, applied, rejoinFrom: null };
  return { follow: { ...follow, joining: true }, applied, rejoinFrom: follow.held.version };
}
