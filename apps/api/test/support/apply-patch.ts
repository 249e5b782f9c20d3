import type { LineupChange, LineupPatch, LineupSnapshot } from '@catline/contracts';

/** What a client does with one change: replace the patched parts by id and take the change's version. */
export function applyPatch(snapshot: LineupSnapshot, version: number, patch: LineupPatch): LineupSnapshot {
  const replace = <T>(items: readonly T[], updates: readonly T[] | undefined, idOf: (item: T) => number): T[] => {
    if (!updates) return [...items];
    const byId = new Map(updates.map((item) => [idOf(item), item]));
    const kept = items.map((item) => byId.get(idOf(item)) ?? item);
    const known = new Set(items.map(idOf));
    return [...kept, ...updates.filter((item) => !known.has(idOf(item)))];
  };
  return {
    cycle: patch.cycle ?? snapshot.cycle,
    lanes: replace(snapshot.lanes, patch.lanes, (lane) => lane.catapultId),
    pool: patch.pool ?? snapshot.pool,
    slots: replace(snapshot.slots, patch.slots, (slot) => slot.id),
    lastLaunchAt: 'lastLaunchAt' in patch ? (patch.lastLaunchAt ?? null) : snapshot.lastLaunchAt,
    version,
  };
}

export const applyChanges = (snapshot: LineupSnapshot, changes: readonly LineupChange[]): LineupSnapshot =>
  changes.reduce((held, change) => applyPatch(held, change.version, change.patch), snapshot);
