import type { LineupChange, LineupPatch, LineupSnapshot } from './lineup.js';

function replaceById<T>(items: readonly T[], updates: readonly T[] | undefined, idOf: (item: T) => number): T[] {
  if (!updates) return [...items];
  const byId = new Map(updates.map((item) => [idOf(item), item]));
  const known = new Set(items.map(idOf));
  return [...items.map((item) => byId.get(idOf(item)) ?? item), ...updates.filter((item) => !known.has(idOf(item)))];
}

/**
 * What every client does with one change: replace the patched parts by id (adding new ones) and
 * take the change's version. The server's diff is defined against this.
 */
export function applyLineupPatch(snapshot: LineupSnapshot, version: number, patch: LineupPatch): LineupSnapshot {
  return {
    // The ship's steps change with its profile, not with a cycle's change: a fresh snapshot brings them.
    readinessSteps: snapshot.readinessSteps,
    cycle: patch.cycle ?? snapshot.cycle,
    lanes: replaceById(snapshot.lanes, patch.lanes, (lane) => lane.catapultId),
    pool: patch.pool ?? snapshot.pool,
    slots: replaceById(snapshot.slots, patch.slots, (slot) => slot.id),
    lastLaunchAt: 'lastLaunchAt' in patch ? (patch.lastLaunchAt ?? null) : snapshot.lastLaunchAt,
    version,
  };
}

/** Applies changes in the order given; the caller keeps them in version order. */
export function applyLineupChanges(snapshot: LineupSnapshot, changes: readonly LineupChange[]): LineupSnapshot {
  return changes.reduce((held, change) => applyLineupPatch(held, change.version, change.patch), snapshot);
}
