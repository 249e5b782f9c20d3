import {
  applyLineupPatch,
  type ChangeKind,
  type CycleReplay,
  type LineupSnapshot,
  type SlotView,
} from '@catline/contracts';

/** The lineup after each step: index 0 is the empty cycle at version 0, index n the lineup after the n-th change. */
export function replaySteps(replay: CycleReplay): LineupSnapshot[] {
  const steps = [replay.start];
  for (const change of replay.changes)
    steps.push(applyLineupPatch(steps[steps.length - 1], change.version, change.patch));
  return steps;
}

export const CHANGE_KIND_LABELS: Record<ChangeKind, string> = {
  slot_moved: 'Move',
  suggestion_applied: 'Suggestion applied',
  aircraft_down: 'Down',
  catapult_status_set: 'Catapult status',
  slot_advanced: 'Readiness',
  slot_suspended: 'Suspend',
  slot_launched: 'Launch',
  weight_acknowledged: 'Weight acknowledged',
  conditions_changed: 'Conditions',
  cycle_started: 'Cycle started',
  cycle_stopped: 'Launching stopped',
  cycle_closed: 'Cycle closed',
  air_plan_imported: 'Air plan imported',
  slot_added: 'Aircraft added',
  gate_waived: 'Waiver',
  aircraft_towed: 'Tow',
  landing_area_set: 'Landing area',
  deck_status_set: 'Deck status',
  launch_prerequisite_set: 'Launch prerequisite',
  respot_built: 'Respot',
  respot_tow_done: 'Respot tow',
  spare_called: 'Spare called',
  pilot_assigned: 'Pilot',
  aircraft_up: 'Up again',
  slot_returned: 'Back to the pool',
  hangfire: 'Hangfire',
  cold_shot_suspected: 'Suspected cold shot',
  down_on_catapult: 'Down on the catapult',
  suspend_reason_given: 'Suspend reason',
  load_set: 'Fuel and stores',
  arm_state_set: 'Armed or safe',
  launch_data_changed: 'Launch data',
  readiness_steps_changed: 'Readiness steps',
};

/** Slots in no lane and not in the deck pool: down or scratched aircraft. */
export function outOfLineup(snapshot: LineupSnapshot): SlotView[] {
  const placed = new Set([...snapshot.lanes.flatMap((lane) => lane.slotIds), ...snapshot.pool]);
  return snapshot.slots.filter((slot) => !placed.has(slot.id));
}

/** Keys that step the replay, and how far: the arrow keys by one, Page Up/Down by ten, Home/End to the ends. */
export function stepForKey(key: string, current: number, last: number): number | null {
  const moves: Record<string, number> = {
    ArrowLeft: current - 1,
    ArrowRight: current + 1,
    PageUp: current - 10,
    PageDown: current + 10,
    Home: 0,
    End: last,
  };
  const target = moves[key];
  return target === undefined ? null : Math.min(last, Math.max(0, target));
}
