import type { LineupChange, PlannedBasis, SlotView } from '@catline/contracts';

export interface SuspendEvent {
  slotId: number;
  catapultId: number | null;
  at: string;
  reason: string;
  by: string;
  resumedAt: string | null;
}

export interface DownEvent {
  slotId: number;
  /** The lane it left; null when it went down in the deck pool. */
  catapultId: number | null;
  at: string;
  by: string;
}

/** What a report reads from a cycle's change log. */
export interface ChangeLogReading {
  /** Every slot as it stood at the planned basis, by slot id. */
  plannedViews: Map<number, SlotView>;
  plannedBasis: PlannedBasis;
  plannedAtVersion: number;
  startedAt: string | null;
  closedAt: string | null;
  suspends: SuspendEvent[];
  downs: DownEvent[];
  /** Who recorded each launch (the catapult officer), by slot id. */
  launchedBy: Map<number, string>;
}

/**
 * Replays the change log's slot views in version order. Every slot enters the log through the
 * change that added it (its patch carries the whole view), and every later change carries the
 * views it altered, so the views held after a change are the lineup's slots at that version.
 * Status transitions between consecutive views are the suspends and down aircraft.
 */
export function readChangeLog(changes: readonly LineupChange[]): ChangeLogReading {
  const held = new Map<number, SlotView>();
  const suspends: SuspendEvent[] = [];
  const downs: DownEvent[] = [];
  const launchedBy = new Map<number, string>();
  let startedAt: string | null = null;
  let closedAt: string | null = null;
  let atStart: { views: Map<number, SlotView>; version: number } | null = null;

  for (const change of changes) {
    for (const view of change.patch.slots ?? []) {
      const before = held.get(view.id);
      if (view.status === 'suspended' && before?.status !== 'suspended') {
        suspends.push({
          slotId: view.id,
          catapultId: view.catapultId,
          at: change.at,
          reason: view.suspendReason ?? '',
          by: change.actor.name,
          resumedAt: null,
        });
      }
      // The reason is chosen after the tap that suspended.
      if (before?.status === 'suspended' && view.status === 'suspended' && view.suspendReason) {
        const open = suspends.findLast((event) => event.slotId === view.id);
        if (open) open.reason = view.suspendReason;
      }
      if (before?.status === 'suspended' && view.status === 'on_catapult') {
        const open = suspends.findLast((event) => event.slotId === view.id);
        if (open) open.resumedAt = change.at;
      }
      if (view.status === 'down' && before?.status !== 'down') {
        downs.push({ slotId: view.id, catapultId: before?.catapultId ?? null, at: change.at, by: change.actor.name });
      }
      if (view.status === 'launched' && before?.status !== 'launched') launchedBy.set(view.id, change.actor.name);
      held.set(view.id, view);
    }
    if (change.kind === 'cycle_started' && atStart === null) {
      startedAt = change.at;
      atStart = { views: new Map(held), version: change.version };
    }
    if (change.kind === 'cycle_closed') closedAt = change.at;
  }

  const lastVersion = changes.at(-1)?.version ?? 0;
  return {
    plannedViews: atStart?.views ?? held,
    plannedBasis: atStart ? 'cycle_start' : 'latest_plan',
    plannedAtVersion: atStart?.version ?? lastVersion,
    startedAt,
    closedAt,
    suspends,
    downs,
    launchedBy,
  };
}
