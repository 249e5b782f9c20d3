import {
  CATAPULT_SETTING,
  READINESS_STEPS,
  type LineupSnapshot,
  type ReadinessStep,
  type SlotView,
} from '@catline/contracts';
import { STEP_LABELS } from '../../lib/readiness-step-labels.js';

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

/** How far along the ship's readiness steps a slot is: the index of its last step done, -1 before the first. */
export function stepIndex(slot: SlotView, steps: readonly ReadinessStep[]): number {
  return steps.indexOf(slot.status as ReadinessStep);
}

export const canSuspend = (slot: SlotView) => (READINESS_STEPS as readonly string[]).includes(slot.status);

/** The figure the crew records as agreed: the pilot's answer from the tablet, else the planned weight shown. */
export const weightToRecord = (slot: SlotView): number => slot.pilotWeightAckLb ?? slot.grossWeightLb;

/**
 * The setting as typed from the catapult's console: a whole number in the settings' range, or null while
 * the field holds anything else. Whether it is the approved one is the server's to judge.
 */
export function readBackFigure(typed: string): number | null {
  const text = typed.trim();
  if (!/^\d{1,3}$/.test(text)) return null;
  const figure = Number(text);
  return figure >= CATAPULT_SETTING.min && figure <= CATAPULT_SETTING.max ? figure : null;
}

/** What the crew fits at the hook-up: the type's holdback release element, or a word that it is not recorded. */
export const holdbackLabel = (slot: SlotView): string =>
  `Holdback: ${slot.holdbackElement ?? `not recorded for the ${slot.typeDesignation}`}`;

/**
 * Everything that still stands between this aircraft and the shot, in the deck crew's words: the
 * server's own launch gates (so the station never offers a shot the server would refuse), then the step.
 */
export function launchBlockers(slot: SlotView, steps: readonly ReadinessStep[]): string[] {
  const blockers = (slot.gates ?? []).filter((gate) => !gate.waived).map((gate) => gate.message);
  const last = steps[steps.length - 1];
  if (slot.status !== last) blockers.push(`Not yet at “${STEP_LABELS[last]}”.`);
  return blockers;
}

const stepOrder = (status: string) => (READINESS_STEPS as readonly string[]).indexOf(status);

/** A hangfire can only follow a shot fired, so only once tension is taken. */
export const canReportHangfire = (slot: SlotView) => stepOrder(slot.status) >= stepOrder('tensioned');

/** Hooked up or further, or suspended there: the aircraft is on the catapult and can go down on it. */
export const canGoDownOnCatapult = (slot: SlotView) =>
  slot.status === 'suspended' || stepOrder(slot.status) > stepOrder('taxiing');

/** The aircraft launched last from my catapult: the one a suspected cold shot is reported on. */
export function lastLaunched(snapshot: LineupSnapshot, catapultId: number): SlotView | undefined {
  return snapshot.slots
    .filter((slot) => slot.catapultId === catapultId && slot.launchedAt !== null)
    .sort((a, b) => Date.parse(b.launchedAt!) - Date.parse(a.launchedAt!))[0];
}
