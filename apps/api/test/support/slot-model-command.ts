import type { LineupSnapshot, SlotStatus, SlotView } from '@catline/contracts';
import { type LineupModel, ModelCommand, type Person, type SlotFacts, byId, lanesOf } from './lineup-model-commands.js';

/**
 * What the model's commands on one aircraft share: how they pick the aircraft and the person who sends
 * the command, and how they build its path, basis and accepted prediction.
 */

export const GONE: readonly SlotStatus[] = ['launched', 'down', 'scratched'];

const slotIn = (snapshot: LineupSnapshot, id: number) => snapshot.slots.find((slot) => slot.id === id)!;

/** 0 for the first aircraft of its lane not yet gone, 1 for the one behind it, … */
export function placeInLane(snapshot: LineupSnapshot, slot: SlotView): number {
  const lane = snapshot.lanes.find((candidate) => candidate.catapultId === slot.catapultId);
  const waiting = (lane?.slotIds ?? []).filter((id) => !GONE.includes(slotIn(snapshot, id).status));
  return Math.max(0, waiting.indexOf(slot.id));
}

/**
 * Mostly an aircraft the command is meant for (`meant`; by default one that may take a readiness step: the
 * head of a lane, or the one behind it before it taxis), now and then any aircraft, which the rules must
 * refuse or take as well.
 */
export function pickSlot(snapshot: LineupSnapshot, pick: number, meant?: (slot: SlotView) => boolean): SlotView {
  const stepping = (slot: SlotView) =>
    slot.catapultId !== null &&
    !GONE.includes(slot.status) &&
    (placeInLane(snapshot, slot) === 0 || (placeInLane(snapshot, slot) === 1 && slot.status === 'planned'));
  const likely = byId(snapshot).filter(meant ?? stepping);
  if (likely.length > 0 && pick % 5 !== 0) return likely[pick % likely.length];
  const slots = byId(snapshot);
  return slots[pick % slots.length];
}

const officers = (model: LineupModel) => model.people.filter((person) => person.role === 'catapult_officer');
const pilots = (model: LineupModel) => model.people.filter((person) => person.role === 'pilot');

/** The slot's own catapult officer, or (wrong) any officer by `pick`. */
export function officerFor(model: LineupModel, slot: SlotView, right: boolean, pick: number): Person {
  const own = officers(model).find((person) => person.catapultId === slot.catapultId);
  return right && own ? own : officers(model)[pick % officers(model).length];
}

/** The slot's own pilot, or (wrong) any pilot by `pick`. */
export function pilotFor(model: LineupModel, slot: SlotView, right: boolean, pick: number): Person {
  const own = pilots(model).find((person) => person.userId === slot.pilotId);
  return right && own ? own : pilots(model)[pick % pilots(model).length];
}

/** Refused unless `person` is of the slot's catapult crew. */
export const notOwnCatapult = (person: Person, slot: SlotView) =>
  person.role !== 'catapult_officer' || person.catapultId !== slot.catapultId;

export abstract class SlotCommand extends ModelCommand {
  constructor(
    protected readonly slotPick: number,
    /** The person the command is meant for; false: someone picked by `personPick`. */
    protected readonly rightPerson: boolean,
    protected readonly personPick: number,
    protected readonly stale: boolean,
  ) {
    super(0);
  }

  protected describe(kind: string, extra = ''): string {
    return `${kind}(slot #${this.slotPick}${this.rightPerson ? '' : `, person #${this.personPick}`}${this.stale ? ', stale' : ''}${extra})`;
  }

  protected basis(slot: SlotView) {
    return { slotVersion: this.stale ? slot.version + 1 : slot.version };
  }

  protected path(model: LineupModel, slot: SlotView, action: string) {
    return `/api/cycles/${model.snapshot.cycle.id}/lineup/slots/${slot.id}/${action}`;
  }

  /** Accepted, leaving the lanes as they are (or as given) and the slot's facts changed by `facts`. */
  protected accepted(model: LineupModel, slot: SlotView, facts: Partial<SlotFacts>, lanes = lanesOf(model.snapshot)) {
    return { status: 200 as const, lanes, slots: new Map([[slot.id, facts]]) };
  }
}
