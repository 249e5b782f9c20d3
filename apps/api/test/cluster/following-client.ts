import type { LineupChange, LineupSnapshot } from '@catline/contracts';
import { applyLineupPatch } from '@catline/contracts';
import { type ClientSocket, connected, join, openSocket } from '../support/socket-client.js';
import { CLUSTER_ORIGIN } from './api-cluster.js';

const RECONNECT_TRIES = 50;
const RECONNECT_PAUSE_MS = 100;
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * A board client that follows one cycle by the clients' rule: it applies a change only when it is the
 * next version and ignores versions it already holds; on a gap it joins again with `sinceVersion` and
 * takes the replay from the change log. When its API process goes away it connects to the next
 * address in its list and does the same. It records every version it applied, in order.
 */
export class FollowingClient {
  readonly applied: number[] = [];
  /** What went wrong while catching up or failing over (a test expects none). */
  readonly failures: string[] = [];
  gaps = 0;
  /** Changes applied from a rejoin's replay rather than from their broadcast. */
  replayed = 0;
  failovers = 0;
  snapshot?: LineupSnapshot;
  private socket?: ClientSocket;
  private early: LineupChange[] = [];
  private highestSeen = 0;
  private catchingUp = false;
  private rejoinWanted = false;
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

  get version(): number {
    return this.snapshot?.version ?? 0;
  }

  async start(): Promise<void> {
    await this.connect();
    const result = await join(this.socket!, { cycleId: this.cycleId });
    if (!result.ok || result.mode !== 'snapshot') throw new Error(`Joining cycle ${this.cycleId} at ${this.url} answered ${JSON.stringify(result)}`);
    this.snapshot = result.snapshot;
    // Broadcasts that arrived in the same read as the answer.
    this.early.splice(0).forEach((change) => this.receive(change));
  }

  close(): void {
    this.closed = true;
    this.socket?.close();
  }

  private async connect(): Promise<void> {
    const socket = openSocket(this.url, { token: this.token, origin: CLUSTER_ORIGIN });
    this.socket = socket;
    socket.on('lineup:change', (change) => this.receive(change));
    await connected(socket);
    socket.once('disconnect', () => {
      if (!this.closed) this.inBackground(this.failOver());
    });
  }

  private receive(change: LineupChange, fromReplay = false): void {
    if (!this.snapshot) {
      this.early.push(change);
      return;
    }
    this.highestSeen = Math.max(this.highestSeen, change.version);
    if (change.version <= this.snapshot.version) return;
    if (change.version === this.snapshot.version + 1) {
      this.snapshot = applyLineupPatch(this.snapshot, change.version, change.patch);
      this.applied.push(change.version);
      if (fromReplay) this.replayed += 1;
      return;
    }
    this.gaps += 1;
    this.inBackground(this.catchUp());
  }

  /**
   * Joins again with the version held, until the client holds everything it has seen announced. A join
   * cut off by a lost connection is asked again on the connection the failover opens.
   */
  private async catchUp(): Promise<void> {
    this.rejoinWanted = true;
    if (this.catchingUp) return;
    this.catchingUp = true;
    try {
      while (!this.closed && (this.rejoinWanted || this.highestSeen > this.version)) {
        if (!this.socket?.connected) {
          await pause(RECONNECT_PAUSE_MS);
          continue;
        }
        this.rejoinWanted = false;
        const result = await join(this.socket!, { cycleId: this.cycleId, sinceVersion: this.version }).catch(() => null);
        if (!result) {
          this.rejoinWanted = true;
          await pause(RECONNECT_PAUSE_MS);
          continue;
        }
        if (!result.ok) throw new Error(`Rejoining cycle ${this.cycleId} at ${this.url} was refused: ${result.message}`);
        if (result.mode !== 'replay') throw new Error(`Rejoining at version ${this.version} answered a snapshot instead of a replay`);
        result.changes.forEach((change) => this.receive(change, true));
      }
    } finally {
      this.catchingUp = false;
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
    await this.catchUp();
  }
}
