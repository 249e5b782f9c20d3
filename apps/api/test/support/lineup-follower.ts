import {
  type CycleFollow,
  type FollowStep,
  followChange,
  followJoin,
  followJoinAsked,
  followJoinFailed,
  type JoinCycleResult,
  type LineupSnapshot,
  startFollow,
} from '@catline/contracts';
import { io } from 'socket.io-client';
import type { ClientSocket } from './socket-client.js';

export interface FollowerOptions {
  url: string;
  origin: string;
  token: string;
  cycleId: number;
  /** Reconnect after losing the server, as the web app does (off for specs that restart nothing). */
  reconnect?: boolean;
  /** Ask again this long after a refused join, as the web app does (by default a refusal is final). */
  rejoinAfterRefusalMs?: number;
}

/**
 * A client that holds a cycle's lineup by the clients' one rule (`cycle-follow` in @catline/contracts,
 * as the web app does): it joins the room and after a reconnect or a gap rejoins from the version it
 * holds (replay or snapshot). It records gaps, and refused or unanswered joins.
 */
export class LineupFollower {
  readonly socket: ClientSocket;
  readonly problems: string[] = [];
  /** When each resync after a reconnect completed (ms since the epoch). */
  readonly resyncedAt: number[] = [];
  /** Rejoins the rule asked for because a version was missing from the broadcast. */
  gaps = 0;
  private follow: CycleFollow = startFollow();
  private joinedOnThisConnection = false;

  constructor(private readonly options: FollowerOptions) {
    this.socket = io(options.url, {
      transports: ['websocket'],
      forceNew: true,
      reconnection: options.reconnect ?? false,
      reconnectionDelay: 200,
      reconnectionDelayMax: 1_000,
      auth: { token: options.token },
      extraHeaders: { origin: options.origin },
    });
    this.socket.on('lineup:change', (change) => this.take(followChange(this.follow, change)));
    this.socket.on('connect', () => void this.join());
    this.socket.on('disconnect', () => {
      this.joinedOnThisConnection = false;
    });
  }

  get held(): LineupSnapshot | null {
    return this.follow.held;
  }

  /** Resolves once the first join has answered. */
  async ready(timeoutMs = 15_000): Promise<this> {
    const deadline = Date.now() + timeoutMs;
    while (!this.held) {
      if (Date.now() > deadline)
        throw new Error(`Follower never joined cycle ${this.options.cycleId}: ${this.problems.join('; ')}`);
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    return this;
  }

  get version(): number {
    return this.held?.version ?? -1;
  }

  close(): void {
    this.socket.disconnect();
  }

  private async join(): Promise<void> {
    const reconnected = this.held !== null && this.socket.connected && !this.joinedOnThisConnection;
    this.joinedOnThisConnection = true;
    this.follow = followJoinAsked(this.follow);
    let result: JoinCycleResult;
    try {
      result = await this.socket.timeout(10_000).emitWithAck('cycle:join', {
        cycleId: this.options.cycleId,
        ...(this.held ? { sinceVersion: this.held.version } : {}),
      });
    } catch (error) {
      this.problems.push(`join got no answer: ${String(error)}`);
      this.take(followJoinFailed(this.follow));
      return;
    }
    if (!result.ok) {
      this.problems.push(`join refused: ${result.code} ${result.message}`);
      const { rejoinAfterRefusalMs } = this.options;
      if (rejoinAfterRefusalMs !== undefined)
        setTimeout(() => this.socket.connected && this.follow.joining && void this.join(), rejoinAfterRefusalMs);
      return;
    }
    this.take(followJoin(this.follow, result));
    if (reconnected) this.resyncedAt.push(Date.now());
  }

  private take(step: FollowStep): void {
    this.follow = step.follow;
    if (step.rejoinFrom === null) return;
    this.gaps += 1;
    void this.join();
  }
}

/** Polls until every follower holds `version`, failing after `timeoutMs` with who lags. */
export async function allAt(followers: readonly LineupFollower[], version: number, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (followers.some((follower) => follower.version !== version)) {
    if (Date.now() > deadline) {
      const lagging = followers.map((follower) => follower.version).filter((held) => held !== version);
      throw new Error(
        `${lagging.length} clients are not at version ${version} (they hold ${lagging.slice(0, 5).join(', ')})`,
      );
    }
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}
