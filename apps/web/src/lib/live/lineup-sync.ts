import type { QueryClient } from '@tanstack/react-query';
import { applyLineupPatch, type LineupChange, type LineupSnapshot } from '@catline/contracts';
import { lineupKeys } from './lineup-keys.js';

/**
 * Keeps each cycle's cached lineup snapshot in step with the server: changes are applied strictly in
 * version order, each once; a change that arrives ahead of its predecessor waits, and the gap is reported
 * so the caller can ask for what was missed.
 */
export class LineupSync {
  private readonly waiting = new Map<number, Map<number, LineupChange>>();

  constructor(
    private readonly queryClient: QueryClient,
    private readonly onGap: (cycleId: number, sinceVersion: number) => void,
  ) {}

  ingest(change: LineupChange): void {
    const key = lineupKeys.snapshot(change.cycleId);
    const current = this.queryClient.getQueryData<LineupSnapshot>(key);
    if (current && change.version <= current.version) return;
    this.waitingFor(change.cycleId).set(change.version, change);
    if (!current) return;
    const next = this.catchUp(current);
    if (next !== current) this.queryClient.setQueryData(key, next);
    if (this.waitingFor(change.cycleId).size > 0) this.onGap(change.cycleId, next.version);
  }

  /** Takes a full snapshot unless the cache already holds a newer one. */
  acceptSnapshot(snapshot: LineupSnapshot): void {
    const key = lineupKeys.snapshot(snapshot.cycle.id);
    this.queryClient.setQueryData<LineupSnapshot>(key, (current) => this.catchUp(this.newer(current, snapshot)));
  }

  newer(current: LineupSnapshot | undefined, fetched: LineupSnapshot): LineupSnapshot {
    return current && current.version > fetched.version ? current : fetched;
  }

  /** Applies the waiting changes that directly follow the snapshot and drops the ones it already holds. */
  catchUp(snapshot: LineupSnapshot): LineupSnapshot {
    const waiting = this.waiting.get(snapshot.cycle.id);
    if (!waiting) return snapshot;
    let result = snapshot;
    for (const version of [...waiting.keys()].sort((a, b) => a - b)) {
      if (version <= result.version) {
        waiting.delete(version);
      } else if (version === result.version + 1) {
        const change = waiting.get(version)!;
        result = applyLineupPatch(result, change.version, change.patch);
        waiting.delete(version);
      } else {
        break;
      }
    }
    return result;
  }

  forget(cycleId: number): void {
    this.waiting.delete(cycleId);
  }

  private waitingFor(cycleId: number): Map<number, LineupChange> {
    let waiting = this.waiting.get(cycleId);
    if (!waiting) {
      waiting = new Map();
      this.waiting.set(cycleId, waiting);
    }
    return waiting;
  }
}
