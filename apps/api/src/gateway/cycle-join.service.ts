import { setTimeout as delay } from 'node:timers/promises';
import { MAX_REPLAY_CHANGES, type JoinCycleRequest, type JoinCycleResult } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { LineupChangeFeed } from '../cycle-changes/change-feed.service.js';
import { LineupChangesService } from '../cycle-changes/lineup-changes.service.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';

/** How a joining socket enters the room and gets its answer; both are called together, synchronously. */
export interface JoinDelivery {
  enter(): void;
  answer(result: JoinCycleResult): void;
}

// Reads are retried while changes publish under them; past this many tries the client's own
// rule (ignore versions it already holds) covers the rest.
const MAX_ATTEMPTS = 20;
const PENDING_WAIT_MS = 10;

/**
 * Joining a cycle's room without losing or repeating a change. The answer covers every version
 * published before the socket entered the room, and nothing published after: it is read, then the
 * socket enters and is answered in one synchronous step, re-reading first if more was published
 * meanwhile. A replay leaves out committed versions still waiting in the feed (the room gets them next).
 */
@Injectable()
export class CycleJoinService {
  constructor(
    private readonly feed: LineupChangeFeed,
    private readonly log: LineupChangesService,
    private readonly snapshots: LineupSnapshotService,
  ) {}

  async join(request: JoinCycleRequest, delivery: JoinDelivery): Promise<void> {
    const { cycleId, sinceVersion } = request;
    const published = () => this.feed.lastPublished(cycleId) ?? 0;
    for (let attempt = 1; ; attempt += 1) {
      const lastTry = attempt >= MAX_ATTEMPTS;
      if (sinceVersion !== undefined) {
        const changes = await this.log.since(cycleId, sinceVersion, MAX_REPLAY_CHANGES + 1);
        const readUpTo = changes.at(-1)?.version ?? sinceVersion;
        const replayable =
          changes.length <= MAX_REPLAY_CHANGES && (changes.length > 0 || (await this.holds(cycleId, sinceVersion)));
        if (replayable) {
          if (published() > readUpTo && !lastTry) continue;
          const pending = this.feed.firstPending(cycleId) ?? Number.POSITIVE_INFINITY;
          delivery.enter();
          delivery.answer({ ok: true, mode: 'replay', changes: changes.filter((change) => change.version < pending) });
          return;
        }
      }
      const snapshot = await this.snapshots.snapshot(cycleId);
      const pending = this.feed.firstPending(cycleId);
      if (!lastTry && (published() > snapshot.version || (pending !== undefined && pending <= snapshot.version))) {
        await delay(PENDING_WAIT_MS);
        continue;
      }
      delivery.enter();
      delivery.answer({ ok: true, mode: 'snapshot', snapshot });
      return;
    }
  }

  /** Whether the cycle has reached `version` (a client ahead of the log gets a snapshot). */
  private async holds(cycleId: number, version: number): Promise<boolean> {
    return (await this.log.currentVersion(cycleId)) >= version;
  }
}
