import {
  type CycleFollow,
  type FollowStep,
  followChange,
  followJoin,
  followJoinAsked,
  type LineupChange,
  type LineupSnapshot,
  startFollow,
} from '@catline/contracts';
import { type ClientSocket, connected, join, openSocket } from '../support/socket-client.js';
import { CLUSTER_ORIGIN } from './api-cluster.js';

const RECONNECT_TRIES = 50;
const RECONNECT_PAUSE_MS = 100;
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * A board client that follows one cycle by the clients' one rule (`cycle-follow` in @catline/contracts,
 * as the web app does): a gap asks for a rejoin with `sinceVersion`, answered by a replay from the
 * change log. When its API process goes away it connects to the next address in its list and joins
 * again from the version it holds. It records every version it applied, in order.
 */
export class FollowingClient {
  readonly applied: number[] = [];
  /** What went wrong while catching up or failing over (a test expects none). */
  readonly failures: string[] = [];
  gaps = 0;
  /** Changes applied from a rejoin's replay rather than from their broadcast. */
  replayed = 0;
  failovers = 0;
  private follow: CycleFollow = startFollow();
  private socket?: ClientSocket;
  private joinLoopRunning = false;
  private closed = false;

  constructor(
    private readonly urls: readonly string[],
    private at: number,
    private readonly token: string,
    private readonly cycleId: number,
  ) {}

  get url(): string {
    return this.urls[this.at];
  }

  get snapshot(): LineupSnapshot | undefined {
    return this.follow.held ?? undefined;
  }

  get version(): number {
    return this.follow.held?.version ?? 0;
  }

  async start(): Promise<void> {
    await this.connect();
    this.follow = followJoinAsked(this.follow);
    const result = await join(this.socket!, { cycleId: this.cycleId });
    if (!result.ok || result.mode !== 'snapshot')
      throw new Error(`Joining cycle ${this.cycleId} at ${this.url} answered ${JSON.stringify(result)}`);
    this.take(followJoin(this.follow, result));
  }

  close(): void {
    this.closed = true;
    this.socket?.close();
  }

  private async connect(): Promise<void> {
    const socket = openSocket(this.url, { token: this.token, origin: CLUSTER_ORIGIN });
    this.socket = socket;
    socket.on('lineup:change', (change) => this.take(followChange(this.follow, change)));
    await connected(socket);
    socket.once('disconnect', () => {
      if (!this.closed) this.inBackground(this.failOver());
    });
  }

  private take(step: FollowStep, replay: readonly LineupChange[] = []): void {
    this.follow = step.follow;
    for (const change of step.applied) {
      this.applied.push(change.version);
      if (replay.some((replayed) => replayed.version === change.version)) this.replayed += 1;
    }
    if (step.rejoinFrom === null) return;
    this.gaps += 1;
    this.inBackground(this.joinWhileAsked());
  }

  /**
   * Sends the join the rule asked for, with the version held, until one is answered (a join cut off by
   * a lost connection is sent again on the connection the failover opens); the answer may ask again.
   */
  private async joinWhileAsked(): Promise<void> {
    if (this.joinLoopRunning) return;
    this.joinLoopRunning = true;
    try {
      while (!this.closed && this.follow.joining) {
        const socket = this.socket;
        const result = socket?.connected
          ? await join(socket, { cycleId: this.cycleId, sinceVersion: this.version }).catch(() => null)
          : null;
        if (!result) {
          await pause(RECONNECT_PAUSE_MS);
          continue;
        }
        if (!result.ok)
          throw new Error(`Rejoining cycle ${this.cycleId} at ${this.url} was refused: ${result.message}`);
        if (result.mode !== 'replay')
          throw new Error(`Rejoining at version ${this.version} answered a snapshot instead of a replay`);
        this.take(followJoin(this.follow, result), result.changes);
      }
    } finally {
      this.joinLoopRunning = false;
    }
  }

  private inBackground(work: Promise<void>): void {
    work.catch((error: unknown) => this.failures.push(error instanceof Error ? error.message : String(error)));
  }

  private async failOver(): Promise<void> {
    this.failovers += 1;
    for (let attempt = 1; ; attempt += 1) {
      this.at = (this.at + 1) % this.urls.length;
      try {
        await this.connect();
        break;
      } catch (error) {
        this.socket?.close();
        if (attempt >= RECONNECT_TRIES) throw error;
        await pause(RECONNECT_PAUSE_MS);
      }
    }
    // What was broadcast while no connection was open is only in the change log.
    this.follow = followJoinAsked(this.follow);
    await this.joinWhileAsked();
  }
}
