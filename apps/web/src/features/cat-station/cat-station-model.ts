import { READINESS_STEPS, type LineupSnapshot, type ReadinessStep, type SlotView } from '@catline/contracts';

const finished = new Set(['launched', 'down', 'scratched']);

/** My catapult's lane: the aircraft on it now (first not yet gone) and the two after it. */
export function catapultQueue(snapshot: LineupSnapshot, catapultId: number) {
  const lane = snapshot.lanes.find((candidate) => candidate.catapultId === catapultId);
  if (!lane) return undefined;
  const slots = new Map(snapshot.slots.map((slot) => [slot.id, slot]));
  const waiting = lane.slotIds
    .map((id) => slots.get(id))
    .filter((slot): slot is SlotView => !!slot && !finished.has(slot.status));
  return { lane, current: waiting[0], next: waiting.slice(1, 3) };
}

export const STEP_LABELS: Record<ReadinessStep, string> = {
  taxiing: 'Taxiing',
  on_catapult: 'On catapult',
  weight_agreed: 'Weight agreed',
  tensioned: 'Tensioned',
};

/** How far along the readiness steps a slot is: the index of its last step done, -1 before the first. */
export function stepIndex(slot: SlotView): number {
  return READINESS_STEPS.indexOf(slot.status as ReadinessStep);
}

export const canSuspend = (slot: SlotView) => stepIndex(slot) >= 0;

/**
 * Everything that still stands between this aircraft and the shot, in the deck crew's words: the
 * server's own launch gates (so the station never offers a shot the server would refuse), then the step.
 */
export function launchBlockers(slot: SlotView): string[] {
  const blockers = (slot.gates ?? []).filter((gate) => !gate.waived).map((gate) => gate.message);
  if (slot.status !== 'tensioned') blockers.push('The aircraft is not tensioned.');
  return blockers;
}
