import {
  applyLineupPatch,
  DEFAULT_WIND_READING_MAX_AGE_MIN,
  type LineupCommandResult,
  SLOT_STATUSES,
  type LineupSnapshot,
  type SlotStatus,
  type SlotView,
} from '@catline/contracts';
import fc from 'fast-check';
import { isDeepStrictEqual } from 'node:util';
import type { Fleet } from './fleet-model-commands.js';
import { type CommandOutcome, type LineupCommand, send } from './random-lineup-commands.js';

/**
 * The model of fast-check's model-based run: the lineup as the rules say it must be. Each command
 * predicts, from the rules alone, the server's answer (accepted, or refused with its status and, where the
 * rules name it, its code) and what an accepted one leaves: the lanes in order, each catapult's status, the
 * cycle's state, each slot's catapult and facts (status, weights answered and agreed, re-verify, suspend
 * reason), the next version. After every command the lineup is read back and compared with that
 * prediction (a refused command must leave it exactly as it was); the accepted change's patch, applied to
 * the model's copy, must also give exactly what was read. Slot version numbers are bookkeeping the server
 * keeps: the model takes them from what it read, to build the next command.
 */
export interface LineupModel {
  snapshot: LineupSnapshot;
  /** Every answer, for the run's own bookkeeping (the change log check). */
  outcomes: CommandOutcome[];
  /** The last readiness step of each slot that its taker may still undo (the server keeps it out of sight). */
  lastSteps: Map<number, LastStep>;
  /** The order aircraft left each catapult in this run: a cold shot is reported on the last one only. */
  launches: Map<number, number[]>;
  /** Who sends the commands (by token): whose command a catapult or a slot takes. */
  people: readonly Person[];
  /**
   * Each aircraft marked down with the spare recorded as its replacement (called for it, or taking its
   * place): a spare so recorded is no longer held aside. Marking the aircraft down again records anew.
   */
  replacedBy: Map<number, number>;
  /** The demo fleet, for the commands that add aircraft or change a type's launch data. */
  fleet?: Fleet;
}

/** Someone who sends commands: `token` indexes the run's tokens; an officer's catapult, a pilot's user id. */
export interface Person {
  token: number;
  role: 'handler' | 'catapult_officer' | 'pilot' | 'air_boss' | 'air_operations' | 'admin';
  userId: number;
  catapultId: number | null;
}

/** A readiness step as the model remembers it: who took it, when the request went out, from and to. */
export interface LastStep {
  byUserId: number;
  sentAt: number;
  from: SlotStatus;
  to: SlotStatus;
  reverifyBefore: SlotView['reverifyCause'];
}

/** What the model follows of a slot besides its place: a part of the slot view. */
export interface SlotFacts {
  status: SlotStatus;
  agreedWeightLb: number | null;
  /** The crew recorded the weight agreed with the pilot (catapultWeightAckAt set). */
  weightAgreed: boolean;
  /** What the pilot answered from the tablet; null until answered. */
  pilotAnswerLb: number | null;
  reverifyCause: SlotView['reverifyCause'];
  suspendReason: string | null;
  pilotId: number | null;
  armState: SlotView['armState'];
  fuelLb: number;
  /** The stores in words. */
  stores: string;
  /** The planned gross weight. */
  grossWeightLb: number;
  /** The planned gross weight is built from fuel and stores set (not the figure typed in the air plan). */
  loadBuilt: boolean;
  /** The soft launch gates the air boss waived for this aircraft, in order. */
  waivedGates: string[];
  /** Where it stands on deck or below: "kind name"; null once airborne. */
  deckPosition: string | null;
}

export const slotFacts = (slot: SlotView): SlotFacts => ({
  status: slot.status,
  agreedWeightLb: slot.agreedWeightLb,
  weightAgreed: slot.catapultWeightAckAt !== null,
  pilotAnswerLb: slot.pilotWeightAckAt === null ? null : slot.pilotWeightAckLb,
  reverifyCause: slot.reverifyCause,
  suspendReason: slot.suspendReason,
  pilotId: slot.pilotId,
  armState: slot.armState,
  fuelLb: slot.fuelLb,
  stores: slot.stores,
  grossWeightLb: slot.grossWeightLb,
  loadBuilt: slot.grossWeightParts !== null,
  waivedGates: slot.waivers.map((waiver) => waiver.gate).sort(),
  deckPosition: slot.deckPosition && `${slot.deckPosition.kind} ${slot.deckPosition.name}`,
});

/** What the model follows of the cycle itself: a part of the cycle view. */
export interface CycleFacts {
  state: LineupSnapshot['cycle']['state'];
  landingArea: LineupSnapshot['cycle']['landingArea'];
  landingAreaReason: string | null;
  /** Each launch prerequisite's tick, in the ship profile's order. */
  ticked: boolean[];
  /** The wind reading in force: when it was taken (ISO 8601), and the true wind's speed. */
  windReadAt: string;
  windKt: number;
  /** The respot built after the last launch: how many targets and tows; null until built. */
  respot: { targets: number; tows: number } | null;
}

export const cycleFacts = ({ cycle }: LineupSnapshot): CycleFacts => ({
  state: cycle.state,
  landingArea: cycle.landingArea,
  landingAreaReason: cycle.landingAreaReason,
  ticked: cycle.launchPrerequisites.map((prerequisite) => prerequisite.ticked),
  windReadAt: cycle.windReadAt,
  windKt: cycle.trueWindSpeedKt,
  respot: cycle.respot && { targets: cycle.respot.targets.length, tows: cycle.respot.tows.length },
});

/**
 * The demo ship's catapults inside the landing area, as the demo seed enters its deck layout: they pause
 * (closed) while the landing area recovers or is fouled, unless already down.
 */
export const LANDING_AREA_CATAPULTS: readonly number[] = [3, 4];

const laneClosed = (number: number, status: string, landingArea: CycleFacts['landingArea']) =>
  status === 'up' && landingArea !== 'clear' && LANDING_AREA_CATAPULTS.includes(number);

export const newModel = (snapshot: LineupSnapshot, people: readonly Person[] = [], fleet?: Fleet): LineupModel => ({
  snapshot,
  outcomes: [],
  lastSteps: new Map(),
  launches: new Map(),
  people,
  replacedBy: new Map(),
  fleet,
});

/** A spare aside until called: planned, and no down aircraft's recorded replacement. */
export const heldSpare = (slot: Pick<SlotView, 'id' | 'spare' | 'status'>, replacedBy: ReadonlyMap<number, number>) =>
  slot.spare && slot.status === 'planned' && ![...replacedBy.values()].includes(slot.id);

/** The replacements after a command that records a spare standing in for a down aircraft. */
function replacedAfter(replacedBy: ReadonlyMap<number, number>, replaces: Expected['replaces']) {
  return replaces ? new Map(replacedBy).set(replaces.down, replaces.spare) : new Map(replacedBy);
}

export interface LineupReal {
  url: string;
  tokens: readonly string[];
  /** The lineup as the server has it now (GET /lineup). */
  read: () => Promise<LineupSnapshot>;
}

export type Lanes = Map<number, number[]>;

export const MAX_DOWN = 4;

export const lanesOf = (snapshot: LineupSnapshot): Lanes =>
  new Map(snapshot.lanes.map((lane) => [lane.catapultId, [...lane.slotIds]]));

const sameIds = (a: readonly number[], b: readonly number[]) =>
  a.length === b.length && a.every((id, i) => id === b[i]);

export const byId = (snapshot: LineupSnapshot) => [...snapshot.slots].sort((a, b) => a.id - b.id);

/** What an accepted command leaves, as the model works it out: lanes, and the slots and catapult it changes. */
export interface Expected {
  lanes: Lanes;
  /** What the command sets of each slot it changes. */
  slots?: ReadonlyMap<number, Partial<SlotFacts>>;
  /** A catapult whose status the command sets. */
  catapult?: { id: number; status: string };
  /** The last aircraft launched: the cycle closes in a change of its own. */
  closesCycle?: boolean;
  /** What the command sets of the cycle itself. */
  cycle?: Partial<CycleFacts>;
  /** Aircraft the command adds to the deck pool, by side number, with what they start with. */
  added?: readonly AddedSlot[];
  /** The spare the command records standing in for a down aircraft. */
  replaces?: { down: number; spare: number };
  /** The answer's status when not 200 (201 for a slot added). */
  answered?: number;
  /** Changes the command makes on the cycle: 1 unless told (0 for an answer that leaves the cycle alone). */
  changes?: 0 | 1;
  /** The air boss's hold on a catapult the command sets: its reason, null for clear to launch. */
  deckHold?: { catapultId: number; reason: string | null };
}

/** An aircraft new in the cycle: its side number and facts (its place on deck: see `startsFree`). */
export interface AddedSlot {
  side: string;
  spare: boolean;
  facts: Omit<SlotFacts, 'deckPosition'>;
}

/** Expected answer: 200 with what it leaves, or the refusal status (and its code, where the model knows it). */
export type Prediction = ({ status: 200 } & Expected) | { status: RefusalStatus; code?: string };

export type RefusalStatus = 400 | 403 | 404 | 409 | 422;

/**
 * What a change under the agreed figures (a new weight, wind or ship's speed) does to an aircraft past the
 * weight agreement, as the readiness rules say: a new weight voids the agreement and takes it back before
 * it; a new wind or new launch data take it back to the agreement, to read the setting back anew. Either way it is marked for
 * re-verify and loses its waivers (given for the figures as they were). Null for one not that far.
 */
export function droppedBack(
  steps: readonly SlotStatus[],
  status: SlotStatus,
  cause: 'weight' | 'wind' | 'launch_data',
): Partial<SlotFacts> | null {
  const agreedAt = steps.indexOf('weight_agreed');
  if (agreedAt < 0 || steps.indexOf(status) < agreedAt) return null;
  const back = { reverifyCause: cause, waivedGates: [] };
  if (cause !== 'weight') return { ...back, status: 'weight_agreed' };
  return { ...back, status: steps[agreedAt - 1] ?? steps[0], agreedWeightLb: null, weightAgreed: false };
}

/**
 * The wind reading in force is older than the ship allows (the demo ship's profile names no age: the
 * default); the model's readings are either fresh or well past it, never near the edge.
 */
export const windReadingStale = (model: Readonly<LineupModel>) =>
  Date.now() >= Date.parse(model.snapshot.cycle.windReadAt) + DEFAULT_WIND_READING_MAX_AGE_MIN * 60_000;

/** Every command but the respot's is refused once the cycle is closed. */
export const cycleClosed = (model: Readonly<LineupModel>) => model.snapshot.cycle.state === 'closed';

/** A refusal with its code. */
export const refusal = (status: RefusalStatus, code: string): Prediction => ({ status, code });

/** A request and what the model says it must do; `token`: whose (by index), the command's handler unless told. */
export interface Request {
  path: string;
  body: object;
  method?: LineupCommand['method'];
  prediction: Prediction;
  token?: number;
  /** The model's own bookkeeping once an accepted command is confirmed. */
  after?: (model: LineupModel, outcome: CommandOutcome) => void;
}

/**
 * The parts of a lineup the model predicts: version, the cycle's facts, lanes with their catapult's status,
 * pause and deck hold, every slot's place and facts.
 */
function observed(snapshot: LineupSnapshot) {
  return {
    version: snapshot.version,
    cycle: cycleFacts(snapshot),
    lanes: snapshot.lanes.map((lane) => ({
      catapultId: lane.catapultId,
      status: lane.status,
      closed: lane.closed,
      deckHoldReason: lane.deckHoldReason,
      slotIds: lane.slotIds,
    })),
    slots: byId(snapshot).map((slot) => ({
      id: slot.id,
      catapultId: slot.catapultId,
      ...slotFacts(slot),
      heldSpare: slot.heldSpare,
    })),
  };
}

/** Planned, down or scratched: the aircraft stands on its deck position (later ones are at a catapult or airborne). */
const standsOnPosition = (slot: SlotView) => ['planned', 'down', 'scratched'].includes(slot.status);

/**
 * Where an added aircraft starts, as the model can tell: in a hangar bay, or on a deck position no other
 * aircraft of the cycle stands on. Its deck position as read when that holds; a word that fails the comparison otherwise.
 */
function startsFree(now: LineupSnapshot, added: SlotView): string | null {
  const position = slotFacts(added).deckPosition;
  if (added.deckPosition?.kind === 'hangar') return position;
  const taken = now.slots.some(
    (other) => other.id !== added.id && standsOnPosition(other) && slotFacts(other).deckPosition === position,
  );
  return taken ? `${position} (held by another aircraft)` : position;
}

/** The model's lineup after an accepted command, from the one before it and the rules' prediction. */
function expectedAfter(
  before: LineupSnapshot,
  expected: Expected,
  replacedBy: ReadonlyMap<number, number>,
  now: LineupSnapshot,
): ReturnType<typeof observed> {
  const called = replacedAfter(replacedBy, expected.replaces);
  // Slot ids are the server's bookkeeping: an added aircraft is found by its side number among the new ids.
  const known = new Set(before.slots.map((slot) => slot.id));
  const added = (expected.added ?? []).map(({ side, spare, facts }) => {
    const read = now.slots.find((slot) => !known.has(slot.id) && slot.sideNumber === side);
    const id = read?.id ?? -1;
    const deckPosition = read ? startsFree(now, read) : null;
    return {
      id,
      catapultId: null,
      ...facts,
      deckPosition,
      heldSpare: heldSpare({ id, spare, status: facts.status }, called),
    };
  });
  const laneOf = (slotId: number) => [...expected.lanes].find(([, ids]) => ids.includes(slotId))?.[0] ?? null;
  const cycle = {
    ...cycleFacts(before),
    ...expected.cycle,
    ...(expected.closesCycle ? { state: 'closed' as const } : {}),
  };
  return {
    version: before.version + (expected.changes ?? 1) + (expected.closesCycle ? 1 : 0),
    cycle,
    lanes: before.lanes.map((lane) => {
      const status = expected.catapult?.id === lane.catapultId ? expected.catapult.status : lane.status;
      return {
        catapultId: lane.catapultId,
        status,
        closed: laneClosed(lane.number, status, cycle.landingArea),
        deckHoldReason:
          expected.deckHold?.catapultId === lane.catapultId ? expected.deckHold.reason : lane.deckHoldReason,
        slotIds: expected.lanes.get(lane.catapultId)!,
      };
    }) as ReturnType<typeof observed>['lanes'],
    slots: [
      ...byId(before).map((slot) => {
        const facts = { ...slotFacts(slot), ...expected.slots?.get(slot.id) };
        return {
          id: slot.id,
          catapultId: laneOf(slot.id),
          ...facts,
          heldSpare: heldSpare({ id: slot.id, spare: slot.spare, status: facts.status }, called),
        };
      }),
      ...added.sort((a, b) => a.id - b.id),
    ],
  };
}

/** A lineup command's answer (a change of launch data answers with the aircraft type instead). */
const isLineupCommandResult = (body: unknown): body is LineupCommandResult =>
  typeof body === 'object' && body !== null && 'change' in body && 'version' in body;

export abstract class ModelCommand implements fc.AsyncCommand<LineupModel, LineupReal> {
  constructor(readonly handler: number) {}

  check(_model: Readonly<LineupModel>): boolean {
    return true;
  }

  protected abstract request(model: LineupModel): Request;

  /** What a command must fetch or send before its request (an upload's preview, the tables held). */
  protected async prepare(_model: LineupModel, _real: LineupReal): Promise<void> {}

  async run(model: LineupModel, real: LineupReal): Promise<void> {
    await this.prepare(model, real);
    const { path, body, method, prediction, token = this.handler, after } = this.request(model);
    const outcome = await send(real.url, real.tokens[token], { path, body, method }, token);
    model.outcomes.push(outcome);
    const answer = `${this.toString()} answered ${outcome.status} ${JSON.stringify(outcome.body)}`;
    const code = (outcome.body as { code?: string } | null)?.code;
    const status = prediction.status === 200 ? (prediction.answered ?? 200) : prediction.status;
    if (outcome.status !== status || ('code' in prediction && prediction.code && code !== prediction.code))
      throw new Error(`expected ${status} ${'code' in prediction ? (prediction.code ?? '') : ''}: ${answer}`);
    const now = await real.read();
    const expected =
      prediction.status === 200
        ? expectedAfter(model.snapshot, prediction, model.replacedBy, now)
        : observed(model.snapshot);
    if (!isDeepStrictEqual(observed(now), expected)) {
      throw new Error(
        `${answer}; the lineup is ${JSON.stringify(observed(now))}, the model says ${JSON.stringify(expected)}`,
      );
    }
    // A closing cycle adds a change of its own after the command's: its patch alone is not the lineup read.
    if (prediction.status === 200 && prediction.changes === 0) {
      if (!isDeepStrictEqual(now, model.snapshot)) throw new Error(`${answer}; it changed the lineup`);
    } else if (prediction.status === 200 && !prediction.closesCycle) {
      // A change of launch data answers with the aircraft type: its lineup is checked against the model alone.
      const result = outcome.body;
      if (isLineupCommandResult(result)) {
        const patched = applyLineupPatch(model.snapshot, result.version, result.change.patch);
        if (!isDeepStrictEqual(patched, now))
          throw new Error(`${answer}; its patch does not give the lineup read back`);
      }
    } else if (prediction.status !== 200 && !isDeepStrictEqual(now, model.snapshot)) {
      throw new Error(`${answer}; the refused command changed the lineup`);
    }
    if (prediction.status === 200) {
      // A step can be undone until the slot's status changes otherwise (a record of arms or load leaves it).
      for (const [slotId, facts] of prediction.slots ?? []) if (facts.status) model.lastSteps.delete(slotId);
      model.replacedBy = replacedAfter(model.replacedBy, prediction.replaces);
      after?.(model, outcome);
    }
    model.snapshot = now;
  }
}

class MoveCommand extends ModelCommand {
  constructor(
    handler: number,
    private readonly slotPick: number,
    /** -1 for the deck pool, otherwise a lane by its order in the snapshot. */
    private readonly target: number,
    private readonly placePick: number,
    private readonly staleSlot: boolean,
    private readonly staleLane: boolean,
  ) {
    super(handler);
  }

  protected request(model: LineupModel) {
    const { snapshot } = model;
    const slots = byId(snapshot);
    const slot = slots[this.slotPick % slots.length];
    const slotVersion = this.staleSlot ? slot.version + 1 : slot.version;
    const path = `/api/cycles/${snapshot.cycle.id}/lineup/moves`;
    const lanes = lanesOf(snapshot);
    const source = slot.catapultId === null ? undefined : lanes.get(slot.catapultId);
    const refused = (status: 400 | 409) => ({ status }) as const;

    if (this.target < 0) {
      const body = { slotId: slot.id, slotVersion, toCatapultId: null, toIndex: 0, targetLaneOrder: [] };
      if (this.staleSlot || slot.status !== 'planned' || !source) return { path, body, prediction: refused(409) };
      source.splice(source.indexOf(slot.id), 1);
      return { path, body, prediction: { status: 200 as const, lanes } };
    }
    const lane = snapshot.lanes[this.target % snapshot.lanes.length];
    const order = lanes.get(lane.catapultId)!;
    const seen = this.staleLane ? [...order.slice(1), slots[(this.slotPick + 1) % slots.length].id] : [...order];
    const others = order.filter((id) => id !== slot.id);
    const toIndex = this.placePick % (others.length + 2);
    const body = { slotId: slot.id, slotVersion, toCatapultId: lane.catapultId, toIndex, targetLaneOrder: seen };
    // A pilot-less aircraft may not join a catapult's order (an up-again one has lost its pilot to a spare).
    const joinsWithoutPilot = slot.catapultId !== lane.catapultId && slot.pilotId === null;
    if (this.staleSlot || slot.status !== 'planned' || joinsWithoutPilot || !sameIds(seen, order))
      return { path, body, prediction: refused(409) };
    if (toIndex > others.length) return { path, body, prediction: refused(400) };
    const next = [...others];
    next.splice(toIndex, 0, slot.id);
    if (sameIds(next, order)) return { path, body, prediction: refused(409) };
    if (source && source !== order) source.splice(source.indexOf(slot.id), 1);
    lanes.set(lane.catapultId, next);
    return { path, body, prediction: { status: 200 as const, lanes } };
  }

  override toString(): string {
    return `move(handler ${this.handler}, slot #${this.slotPick}, to ${this.target < 0 ? 'pool' : `lane #${this.target}`} place #${this.placePick}${this.staleSlot ? ', stale slot' : ''}${this.staleLane ? ', stale lane' : ''})`;
  }
}

export class MarkDownCommand extends ModelCommand {
  constructor(
    handler: number,
    private readonly slotPick: number,
    private readonly stale: boolean,
    private readonly withSpare: boolean,
  ) {
    super(handler);
  }

  /** Downs cannot be undone: past a few, every later command would meet a lineup with nothing left to move. */
  override check(model: Readonly<LineupModel>): boolean {
    return model.snapshot.slots.filter((slot) => slot.status === 'down').length < MAX_DOWN;
  }

  protected request(model: LineupModel) {
    const { snapshot } = model;
    const slots = byId(snapshot);
    const slot = slots[this.slotPick % slots.length];
    const spare = this.withSpare
      ? slots.find(
          (candidate: SlotView) =>
            candidate.status === 'planned' && candidate.catapultId === null && candidate.id !== slot.id,
        )
      : undefined;
    const path = `/api/cycles/${snapshot.cycle.id}/lineup/slots/${slot.id}/down`;
    const body = {
      slotVersion: this.stale ? slot.version + 1 : slot.version,
      ...(spare ? { spareSlotId: spare.id } : {}),
    };
    // The down aircraft's pilot walks to the spare; without one, the spare must bring its own.
    const spareWithoutPilot = spare !== undefined && slot.pilotId === null && spare.pilotId === null;
    if (cycleClosed(model)) return { path, body, prediction: refusal(409, 'cycle_closed') };
    if (this.stale) return { path, body, prediction: refusal(409, 'stale_basis') };
    // Any aircraft still to launch may go down, wherever it stands in its steps.
    if (['launched', 'down', 'scratched'].includes(slot.status))
      return { path, body, prediction: refusal(409, 'wrong_step') };
    // A second stand-in for one aircraft is refused: the first one's call would go unrecorded.
    if ((spare && (slot.catapultId === null || model.replacedBy.has(slot.id))) || spareWithoutPilot)
      return { path, body, prediction: { status: 409 as const } };
    const lanes = lanesOf(snapshot);
    if (slot.catapultId !== null) {
      const lane = lanes.get(slot.catapultId)!;
      if (spare) lane.splice(lane.indexOf(slot.id), 1, spare.id);
      else lane.splice(lane.indexOf(slot.id), 1);
    }
    const changed = new Map<number, Partial<SlotFacts>>([[slot.id, { status: 'down' }]]);
    // The pilot walks to the spare, and neither has the new pilot's answer on the weight.
    if (spare && slot.pilotId !== null) {
      changed.set(slot.id, { status: 'down', pilotId: null, pilotAnswerLb: null });
      changed.set(spare.id, { pilotId: slot.pilotId, pilotAnswerLb: null });
    }
    // The spare taking its place is recorded; down without one, an earlier stand-in stays recorded.
    return {
      path,
      body,
      prediction: {
        status: 200 as const,
        lanes,
        slots: changed,
        replaces: spare && { down: slot.id, spare: spare.id },
      },
    };
  }

  override toString(): string {
    return `down(handler ${this.handler}, slot #${this.slotPick}${this.withSpare ? ', spare' : ''}${this.stale ? ', stale' : ''})`;
  }
}

/** Hooked up or further, up to the shot: the aircraft a catapult going down suspends. */
export const ON_CATAPULT: readonly SlotStatus[] = SLOT_STATUSES.slice(
  SLOT_STATUSES.indexOf('on_catapult'),
  SLOT_STATUSES.indexOf('launched'),
);

/** The first aircraft of a lane that is on the catapult; undefined for none. */
export function onCatapult(snapshot: LineupSnapshot, catapultId: number): SlotView | undefined {
  const ids = snapshot.lanes.find((lane) => lane.catapultId === catapultId)!.slotIds;
  return ids
    .map((id) => snapshot.slots.find((slot) => slot.id === id)!)
    .find((slot) => ON_CATAPULT.includes(slot.status));
}

export class CatapultStatusCommand extends ModelCommand {
  constructor(
    handler: number,
    private readonly lanePick: number,
    private readonly stale: boolean,
    /** Mark it down even with an aircraft on it (which is then suspended). */
    private readonly confirm: boolean,
  ) {
    super(handler);
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const lane = snapshot.lanes[this.lanePick % snapshot.lanes.length];
    const other = lane.status === 'up' ? 'down' : 'up';
    const path = `/api/cycles/${snapshot.cycle.id}/lineup/catapults/${lane.catapultId}/status`;
    const body = { status: other, basisStatus: this.stale ? other : lane.status, confirm: this.confirm };
    if (cycleClosed(model)) return { path, body, prediction: refusal(409, 'cycle_closed') };
    if (this.stale) return { path, body, prediction: refusal(409, 'stale_basis') };
    const onIt = other === 'down' ? onCatapult(snapshot, lane.catapultId) : undefined;
    if (onIt && !this.confirm) return { path, body, prediction: refusal(409, 'aircraft_on_catapult') };
    const suspended = { status: 'suspended' as const, suspendReason: `cat ${lane.number} down` };
    return {
      path,
      body,
      prediction: {
        status: 200,
        lanes: lanesOf(snapshot),
        catapult: { id: lane.catapultId, status: other },
        slots: new Map(onIt ? [[onIt.id, suspended]] : []),
      },
    };
  }

  override toString(): string {
    return `catapult(handler ${this.handler}, lane #${this.lanePick}${this.stale ? ', stale' : ''}${this.confirm ? ', confirmed' : ''})`;
  }
}

class ApplyLineupCommand extends ModelCommand {
  constructor(
    handler: number,
    /** Per slot (by id order): a lane by its order, or past the last lane for "leave it out". */
    private readonly places: readonly number[],
    private readonly stale: boolean,
  ) {
    super(handler);
  }

  protected request(model: LineupModel) {
    const { snapshot } = model;
    const current = lanesOf(snapshot);
    const slots = new Map(snapshot.slots.map((slot) => [slot.id, slot]));
    const lanes: Lanes = new Map(snapshot.lanes.map((lane) => [lane.catapultId, []]));
    byId(snapshot)
      .filter((slot) => slot.status === 'planned')
      .forEach((slot, i) => {
        const place = this.places[i % this.places.length] % (snapshot.lanes.length + 1);
        if (place < snapshot.lanes.length) lanes.get(snapshot.lanes[place].catapultId)!.push(slot.id);
      });
    const path = `/api/cycles/${snapshot.cycle.id}/lineup/suggestion/apply`;
    const body = {
      basisVersion: this.stale ? Math.max(0, snapshot.version - 1) : snapshot.version,
      lanes: [...lanes].map(([catapultId, slotIds]) => ({ catapultId, slotIds })),
    };
    const unchanged = [...lanes].every(([catapultId, slotIds]) => sameIds(slotIds, current.get(catapultId)!));
    const pilotless = [...lanes.values()].flat().some((slotId) => slots.get(slotId)!.pilotId === null);
    if (this.stale || unchanged || pilotless) return { path, body, prediction: { status: 409 as const } };
    return { path, body, prediction: { status: 200 as const, lanes } };
  }

  override toString(): string {
    return `apply(handler ${this.handler}, places ${this.places.slice(0, 8).join('')}…${this.stale ? ', stale' : ''})`;
  }
}

export class UpAgainCommand extends ModelCommand {
  constructor(
    handler: number,
    private readonly slotPick: number,
    private readonly stale: boolean,
  ) {
    super(handler);
  }

  protected request(model: LineupModel) {
    const { snapshot } = model;
    // Mostly a down aircraft, so that the command is taken; now and then any, which must be refused.
    const down = byId(snapshot).filter((slot) => slot.status === 'down');
    const slots = down.length > 0 && this.slotPick % 4 !== 0 ? down : byId(snapshot);
    const slot = slots[this.slotPick % slots.length];
    const path = `/api/cycles/${snapshot.cycle.id}/lineup/slots/${slot.id}/up`;
    const body = { slotVersion: this.stale ? slot.version + 1 : slot.version, reason: 'Model run: fixed' };
    if (cycleClosed(model)) return { path, body, prediction: refusal(409, 'cycle_closed') };
    if (this.stale || slot.status !== 'down') return { path, body, prediction: { status: 409 as const } };
    const changed = new Map([[slot.id, { status: 'planned' as const }]]);
    return { path, body, prediction: { status: 200 as const, lanes: lanesOf(snapshot), slots: changed } };
  }

  override toString(): string {
    return `up(handler ${this.handler}, slot #${this.slotPick}${this.stale ? ', stale' : ''})`;
  }
}

/** fast-check's commands for a run by `handlers` handlers; downs are rare because they cannot be undone. */
export function lineupModelCommands(handlers: number, maxCommands: number) {
  const handler = fc.nat(handlers - 1);
  const sometimes = fc.nat(4).map((n) => n === 0);
  return fc.commands(
    [
      fc.oneof(
        {
          weight: 40,
          arbitrary: fc
            .tuple(handler, fc.nat(), fc.integer({ min: -1, max: 3 }), fc.nat(), sometimes, sometimes)
            .map((args) => new MoveCommand(...args)),
        },
        {
          weight: 2,
          arbitrary: fc.tuple(handler, fc.nat(), sometimes, fc.boolean()).map((args) => new MarkDownCommand(...args)),
        },
        {
          weight: 3,
          arbitrary: fc
            .tuple(handler, fc.nat(), sometimes, fc.boolean())
            .map((args) => new CatapultStatusCommand(...args)),
        },
        {
          weight: 2,
          arbitrary: fc.tuple(handler, fc.nat(), sometimes).map((args) => new UpAgainCommand(...args)),
        },
        {
          weight: 3,
          arbitrary: fc
            .tuple(handler, fc.array(fc.nat(), { minLength: 1, maxLength: 40 }), sometimes)
            .map((args) => new ApplyLineupCommand(...args)),
        },
      ),
    ],
    { maxCommands, size: 'max' },
  );
}
