import { io, type Socket } from 'socket.io-client';
import { createStore } from 'zustand/vanilla';
import type {
  ClientToServerEvents,
  JoinCycleResult,
  LineupChange,
  LineupSnapshot,
  ServerToClientEvents,
} from '@catline/contracts';
import { endedElsewhere, refreshSession } from '../api-client.js';
import { queryClient } from '../query-client.js';
import { cycleKeys } from '../queries/cycles-query.js';
import { getAccessToken, onAccessTokenChange } from '../session-store.js';
import type { ConnectionState } from './connection-state.js';
import { lineupKeys } from './lineup-keys.js';
import { LineupSync } from './lineup-sync.js';

type CatlineSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** After this long without the server, "reconnecting" becomes "offline since". */
const OFFLINE_AFTER_MS = 10_000;
const ACK_TIMEOUT_MS = 5_000;
/** Keeps the connection through a quick hop between live screens. */
const LINGER_MS = 5_000;

export interface LiveState {
  connection: ConnectionState;
  /** Why the server would not let this person follow a cycle, by cycle id. */
  refusals: ReadonlyMap<number, string>;
  /** Cycles whose lineup has been brought up to the server's version since the link last came up. */
  caughtUp: ReadonlySet<number>;
  /** When each cycle that was caught up stopped being so (the link dropped, or the screen left it). */
  liveUntil: ReadonlyMap<number, Date>;
  /** The lists of cycles on show have been read again since the link last came up; the feed keeps them so. */
  listsCaughtUp: boolean;
  /** When the lists last stopped being caught up (the link dropped). */
  listsLiveUntil: Date | undefined;
}

/**
 * The one owner of the socket.io connection. Screens ask to watch a cycle (through `useLiveCycle`); this
 * module joins the cycle's room, feeds every change into the query cache in version order, asks for what
 * it missed after a gap or a reconnect, and keeps the socket's token fresh.
 */
class LiveCycles {
  private socket: CatlineSocket | null = null;
  private readonly watchers = new Map<number, number>();
  /** Screens showing a list of cycles (or a picker), which follow the ship's cycle statuses. */
  private listFollowers = 0;
  private readonly joining = new Set<number>();
  private readonly resyncTimers = new Map<number, ReturnType<typeof setTimeout>>();
  private offlineTimer: ReturnType<typeof setTimeout> | undefined;
  private lingerTimer: ReturnType<typeof setTimeout> | undefined;
  private retryDelayMs = 1_000;
  /** Counts the lists' catch-ups, so an answer to one the link has since outlived is not taken as current. */
  private listsRound = 0;
  /** What screens show about the link; they read it with `useStore`. */
  readonly state = createStore<LiveState>(() => ({
    connection: { kind: 'connecting' },
    refusals: new Map(),
    caughtUp: new Set(),
    liveUntil: new Map(),
    listsCaughtUp: false,
    listsLiveUntil: undefined,
  }));
  readonly sync = new LineupSync(queryClient, (cycleId) => this.resync(cycleId));

  constructor() {
    onAccessTokenChange((token) => (token ? this.renewSocketToken(token) : this.close()));
    globalThis.addEventListener?.('offline', () => this.markOffline(new Date()));
    globalThis.addEventListener?.('online', () => this.backOnline());
  }

  /** Follows a cycle until the returned function is called. */
  watch(cycleId: number): () => void {
    clearTimeout(this.lingerTimer);
    this.watchers.set(cycleId, (this.watchers.get(cycleId) ?? 0) + 1);
    const socket = this.open();
    if (socket.connected) this.join(cycleId);
    return () => this.unwatch(cycleId);
  }

  /** Keeps the ship's cycles (lists, pickers, states) up with the live feed until the returned function is called. */
  followCycleList(): () => void {
    clearTimeout(this.lingerTimer);
    this.listFollowers += 1;
    const socket = this.open();
    if (socket.connected && !this.state.getState().listsCaughtUp) this.catchUpCycleLists();
    return () => {
      this.listFollowers -= 1;
      this.closeWhenIdle();
    };
  }

  /** A change the server answered a command with: applied in order like any broadcast. */
  receive(change: LineupChange): void {
    this.sync.ingest(change);
  }

  /** The socket may have lived through the outage; either way, ask for what was missed. */
  private backOnline() {
    const socket = this.socket;
    if (!socket) return;
    if (!socket.connected) {
      socket.connect();
      return;
    }
    this.linkUp();
  }

  /** The link is up: every cycle followed, and the lists on show, catch up with what the server has now. */
  private linkUp() {
    clearTimeout(this.offlineTimer);
    this.setConnection({ kind: 'live' });
    for (const cycleId of this.watchers.keys()) this.join(cycleId);
    if (this.listFollowers > 0) this.catchUpCycleLists();
  }

  private unwatch(cycleId: number) {
    const left = (this.watchers.get(cycleId) ?? 1) - 1;
    if (left > 0) {
      this.watchers.set(cycleId, left);
      return;
    }
    this.watchers.delete(cycleId);
    this.sync.forget(cycleId);
    this.setCaughtUp(cycleId, false);
    if (this.socket?.connected) this.socket.emit('cycle:leave', { cycleId }, () => undefined);
    this.closeWhenIdle();
  }

  private closeWhenIdle() {
    if (this.watchers.size === 0 && this.listFollowers === 0)
      this.lingerTimer = setTimeout(() => this.close(), LINGER_MS);
  }

  /**
   * Every list of cycles is read again: a status may have changed, or been missed while the link was down.
   * The lists are current once read while the link stays up; a list that failed to read is not, until read
   * again shortly.
   */
  private catchUpCycleLists() {
    const round = ++this.listsRound;
    const stillCurrent = () => round === this.listsRound && this.state.getState().connection.kind === 'live';
    queryClient.invalidateQueries({ queryKey: cycleKeys.all }, { throwOnError: true }).then(
      () => {
        if (stillCurrent()) this.state.setState({ listsCaughtUp: true });
      },
      () => {
        if (!stillCurrent()) return;
        const { listsCaughtUp, listsLiveUntil } = this.state.getState();
        this.state.setState({ listsCaughtUp: false, listsLiveUntil: listsCaughtUp ? new Date() : listsLiveUntil });
        setTimeout(() => stillCurrent() && this.catchUpCycleLists(), 1_000);
      },
    );
  }

  private open(): CatlineSocket {
    if (this.socket) return this.socket;
    const socket: CatlineSocket = io({
      path: '/socket.io',
      transports: ['websocket'],
      autoConnect: false,
      reconnectionDelay: 500,
      reconnectionDelayMax: 5_000,
      auth: (send) => send({ token: getAccessToken() ?? '' }),
    });
    socket.on('connect', () => {
      this.retryDelayMs = 1_000;
      this.linkUp();
    });
    socket.on('disconnect', (reason) => {
      if (reason === 'io client disconnect') return;
      this.markReconnecting(new Date());
      if (!socket.active) this.retryWithFreshToken(socket);
    });
    socket.on('connect_error', () => {
      this.markReconnecting(new Date());
      // A refusal by the server's middleware (usually an expired token) is not retried by socket.io itself.
      if (!socket.active) this.retryWithFreshToken(socket);
    });
    socket.on('lineup:change', (change) => this.sync.ingest(change));
    socket.on('cycle:status', () => this.catchUpCycleLists());
    socket.on('session:expired', () => {
      // Without an answer the link drops and retries like any other outage.
      refreshSession().then(
        (session) => {
          if (!session) endedElsewhere();
        },
        () => undefined,
      );
    });
    this.socket = socket;
    socket.connect();
    return socket;
  }

  private close() {
    clearTimeout(this.offlineTimer);
    clearTimeout(this.lingerTimer);
    this.resyncTimers.forEach((timer) => clearTimeout(timer));
    this.resyncTimers.clear();
    this.socket?.removeAllListeners();
    this.socket?.disconnect();
    this.socket = null;
    this.joining.clear();
    this.state.setState({
      connection: { kind: 'connecting' },
      refusals: new Map(),
      caughtUp: new Set(),
      liveUntil: new Map(),
      listsCaughtUp: false,
      listsLiveUntil: undefined,
    });
  }

  private retryWithFreshToken(socket: CatlineSocket) {
    const delay = this.retryDelayMs;
    this.retryDelayMs = Math.min(this.retryDelayMs * 2, 30_000);
    setTimeout(() => {
      if (this.socket !== socket) return;
      refreshSession().then(
        (session) => {
          if (!session) endedElsewhere();
          else if (this.socket === socket) socket.connect();
        },
        // No answer: the network is down, not the session; ask again, waiting longer.
        () => this.retryWithFreshToken(socket),
      );
    }, delay);
  }

  private renewSocketToken(accessToken: string) {
    const socket = this.socket;
    if (!socket?.connected) return;
    socket.timeout(ACK_TIMEOUT_MS).emit('session:refresh', { accessToken }, (error, result) => {
      // The server did not take the new token: reconnecting hands it over in the handshake instead.
      if (error || !result.ok) socket.disconnect().connect();
    });
  }

  private cachedVersion(cycleId: number): number | undefined {
    return queryClient.getQueryData<LineupSnapshot>(lineupKeys.snapshot(cycleId))?.version;
  }

  /** Joins with the version held, so the server answers with a replay when it can. */
  private join(cycleId: number) {
    const socket = this.socket;
    if (!socket || this.joining.has(cycleId)) return;
    const sinceVersion = this.cachedVersion(cycleId);
    this.joining.add(cycleId);
    this.sync.joinSent(cycleId);
    socket.timeout(ACK_TIMEOUT_MS).emit('cycle:join', { cycleId, sinceVersion }, (error, result) => {
      this.joining.delete(cycleId);
      if (this.socket !== socket || !this.watchers.has(cycleId)) return;
      if (error) {
        this.sync.joinFailed(cycleId);
        this.resync(cycleId);
        return;
      }
      this.applyJoin(cycleId, result);
    });
  }

  private applyJoin(cycleId: number, result: JoinCycleResult) {
    const refusals = new Map(this.state.getState().refusals);
    if (!result.ok) {
      // Not following the cycle: what waited for a rejoin can no longer be completed.
      this.sync.forget(cycleId);
      refusals.set(cycleId, result.message);
      this.state.setState({ refusals });
      return;
    }
    if (refusals.delete(cycleId)) this.state.setState({ refusals });
    this.sync.acceptJoin(cycleId, result);
    this.setCaughtUp(cycleId, true);
  }

  /** Asks for what was missed since the version held: a replay or snapshot over the socket, or a fresh snapshot over HTTP. */
  private resync(cycleId: number) {
    if (this.resyncTimers.has(cycleId)) return;
    this.resyncTimers.set(
      cycleId,
      setTimeout(() => {
        this.resyncTimers.delete(cycleId);
        if (!this.watchers.has(cycleId)) return;
        if (this.socket?.connected) this.join(cycleId);
        else void queryClient.invalidateQueries({ queryKey: lineupKeys.snapshot(cycleId) });
      }, 300),
    );
  }

  private markReconnecting(since: Date) {
    const current = this.state.getState().connection;
    if (current.kind === 'reconnecting' || current.kind === 'offline') return;
    this.setConnection({ kind: 'reconnecting', since });
    clearTimeout(this.offlineTimer);
    this.offlineTimer = setTimeout(() => this.markOffline(since), OFFLINE_AFTER_MS);
  }

  private markOffline(fallbackSince: Date) {
    const current = this.state.getState().connection;
    if (current.kind === 'offline') return;
    this.setConnection({ kind: 'offline', since: current.kind === 'reconnecting' ? current.since : fallbackSince });
  }

  private setConnection(connection: ConnectionState) {
    // Whatever was caught up may miss changes from here on: each cycle catches up again when it rejoins.
    if (connection.kind === 'live') {
      this.state.setState({ connection });
      return;
    }
    const { caughtUp, liveUntil, listsCaughtUp, listsLiveUntil } = this.state.getState();
    const since = 'since' in connection ? connection.since : new Date();
    const until = new Map(liveUntil);
    for (const cycleId of caughtUp) until.set(cycleId, since);
    this.listsRound += 1;
    this.state.setState({
      connection,
      caughtUp: new Set(),
      liveUntil: until,
      listsCaughtUp: false,
      listsLiveUntil: listsCaughtUp ? since : listsLiveUntil,
    });
  }

  private setCaughtUp(cycleId: number, caughtUp: boolean) {
    const current = this.state.getState();
    if (current.caughtUp.has(cycleId) === caughtUp) return;
    const next = new Set(current.caughtUp);
    const until = new Map(current.liveUntil);
    if (caughtUp) next.add(cycleId);
    else {
      next.delete(cycleId);
      until.set(cycleId, new Date());
    }
    this.state.setState({ caughtUp: next, liveUntil: until });
  }
}

export const liveCycles = new LiveCycles();
