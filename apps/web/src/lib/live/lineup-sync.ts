import type { QueryClient } from '@tanstack/react-query';
import {
  type CycleFollow,
  type FollowStep,
  followChange,
  followJoin,
  followJoinAsked,
  followJoinFailed,
  followSnapshot,
  type JoinCycleResult,
  type LineupChange,
  type LineupSnapshot,
  startFollow,
} from '@catline/contracts';
import { lineupKeys } from './lineup-keys.js';

type JoinAnswer = Extract<JoinCycleResult, { ok: true }>;

/**
 * Keeps each cycle's cached lineup in step with the server by the clients' one rule (`cycle-follow`
 * in @catline/contracts). The query cache holds the lineup; this holds, per cycle, the changes that
 * arrived early and whether a rejoin is under way, and tells the caller when to join again.
 */
export class LineupSync {
  private readonly waiting = new Map<number, Omit<CycleFollow, 'held'>>();

  constructor(
    private readonly queryClient: QueryClient,
    private readonly onRejoin: (cycleId: number) => void,
  ) {}

  ingest(change: LineupChange): void {
    this.advance(change.cycleId, (follow) => followChange(follow, change));
  }

  /** A join is sent: no rejoin is asked for until it answers. */
  joinSent(cycleId: number): void {
    this.advance(cycleId, (follow) => ({ follow: followJoinAsked(follow), applied: [], rejoinFrom: null }));
  }

  /** A join's answer: the snapshot (unless the cache holds a newer one) or the replay. */
  acceptJoin(cycleId: number, answer: JoinAnswer): void {
    this.advance(cycleId, (follow) => followJoin(follow, answer));
  }

  /** A join that got no answer. */
  joinFailed(cycleId: number): void {
    this.advance(cycleId, followJoinFailed);
  }

  /** What the cache should hold after an HTTP read: never older than what it holds, with early changes applied. */
  fetched(snapshot: LineupSnapshot): LineupSnapshot {
    return this.advance(snapshot.cycle.id, (follow) => followSnapshot(follow, snapshot)).follow.held ?? snapshot;
  }

  forget(cycleId: number): void {
    this.waiting.delete(cycleId);
  }

  private advance(cycleId: number, rule: (follow: CycleFollow) => FollowStep): FollowStep {
    const key = lineupKeys.snapshot(cycleId);
    const held = this.queryClient.getQueryData<LineupSnapshot>(key) ?? null;
    const step = rule({ ...startFollow(held), ...this.waiting.get(cycleId) });
    const { held: next, ...rest } = step.follow;
    if (next && next !== held) this.queryClient.setQueryData(key, next);
    this.waiting.set(cycleId, rest);
    if (step.rejoinFrom !== null) this.onRejoin(cycleId);
    return step;
  }
}
