import type { CycleView } from './cycles.js';
import type { LineupChange, LineupSnapshot } from './lineup.js';
import type { RefusalCode } from './refusals.js';

export interface JoinCycleRequest {
  cycleId: number;
  /** The last version the client applied; omitted for a first join. */
  sinceVersion?: number;
}

export type JoinCycleResult =
  | { ok: true; mode: 'snapshot'; snapshot: LineupSnapshot }
  | { ok: true; mode: 'replay'; changes: LineupChange[] }
  | { ok: false; code: RefusalCode; message: string };

export type RefreshSocketResult = { ok: true; expiresAt: string } | { ok: false; message: string };

/** Events the server emits. */
export interface ServerToClientEvents {
  'lineup:change': (change: LineupChange) => void;
  /**
   * A cycle of the person's ship changed as a record (started, stopped, closed, conditions): sent to every
   * socket of the ship, whether or not it follows the cycle, so lists and pickers of cycles keep up.
   */
  'cycle:status': (cycle: CycleView) => void;
  'session:expired': () => void;
}

/** Events the client emits; every one is answered through its acknowledgement. */
export interface ClientToServerEvents {
  'cycle:join': (request: JoinCycleRequest, ack: (result: JoinCycleResult) => void) => void;
  'cycle:leave': (request: { cycleId: number }, ack: (result: { ok: boolean }) => void) => void;
  'session:refresh': (request: { accessToken: string }, ack: (result: RefreshSocketResult) => void) => void;
}

/** Past this many missed changes a rejoining client gets a fresh snapshot instead of a replay. */
export const MAX_REPLAY_CHANGES = 500;
