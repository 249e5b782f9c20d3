import { ARM_STATES, SUSPEND_REASONS, SUSPEND_REASON_LABELS, type SlotStatus, type SlotView } from '@catline/contracts';
import {
  type LineupModel,
  type Person,
  type Request,
  type SlotFacts,
  cycleClosed,
  droppedBack,
  lanesOf,
  refusal,
  slotFacts,
} from './lineup-model-commands.js';
import { GONE, SlotCommand, officerFor, pickSlot, pilotFor } from './slot-model-command.js';

/**
 * The model's commands on what an aircraft carries and who flies it, in a launching cycle: armed or
 * safe, fuel and stores, the pilot, and the reason for a suspend. Each predicts the answer and the
 * slot facts it leaves from the rules as written here.
 */

/** Once launched or scratched, nothing more is recorded of an aircraft's load or arms. */
const RECORDS_CLOSED: readonly SlotStatus[] = ['launched', 'scratched'];

/** A pilot may change aircraft only while the aircraft is planned or down. */
const PILOT_CAN_CHANGE: readonly SlotStatus[] = ['planned', 'down'];

/**
 * The handler records armed or safe for any aircraft; a catapult officer only for one in the order of
 * the officer's own catapult.
 */
export class ArmStateCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    private readonly armed: boolean,
    private readonly byHandler: boolean,
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  protected request(model: LineupModel): Request {
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => !GONE.includes(candidate.status));
    const person = this.byHandler ? model.people[0] : officerFor(model, slot, this.rightPerson, this.personPick);
    const armState = ARM_STATES[this.armed ? 1 : 0];
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'arm-state'),
      body: { ...this.basis(slot), armState },
      prediction,
      token: person.token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (person.role !== 'handler' && (slot.catapultId === null || slot.catapultId !== person.catapultId))
      return answer(refusal(403, 'not_your_catapult'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (RECORDS_CLOSED.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    if (slot.armState === armState) return answer(refusal(409, 'no_change'));
    return answer(this.accepted(model, slot, { armState }));
  }

  override toString(): string {
    return this.describe(`record ${ARM_STATES[this.armed ? 1 : 0]}`, this.byHandler ? ', by the handler' : '');
  }
}

/**
 * The demo fleet's WKD-41 (every aircraft of the launching cycle), as the demo seed enters it: operating
 * weight with crew 29,400 lb; stores catalogue Rocket pod 520 lb each, Drop tank 1,240 lb each.
 */
const WKD_41 = {
  operatingWeightLb: 29_400,
  stores: new Map([
    ['rocket pod', 520],
    ['drop tank', 1_240],
  ]),
};

interface Load {
  fuelLb: number;
  stores: { name: string; count: number }[];
}

/** Loads around the planned 44,000 lb, so that the launch figures stay go; the last names no catalogue item. */
const LOADS: readonly Load[] = [
  { fuelLb: 12_000, stores: [{ name: 'Rocket pod', count: 2 }] },
  {
    fuelLb: 11_500,
    stores: [
      { name: 'rocket pod', count: 2 },
      { name: 'Drop tank', count: 1 },
    ],
  },
  { fuelLb: 14_600, stores: [] },
  { fuelLb: 12_000, stores: [{ name: 'Torpedo', count: 1 }] },
];

/** The stores in words as the slot shows them: the catalogue's spelling, or "Clean". */
const catalogueName = (name: string) => name[0].toUpperCase() + name.slice(1).toLowerCase();
const storesInWords = (load: Load) =>
  load.stores.length === 0
    ? 'Clean'
    : load.stores.map(({ name, count }) => `${count} × ${catalogueName(name)}`).join(', ');

/**
 * The handler sets fuel and stores: the planned gross weight is the operating weight with crew plus fuel
 * plus stores, and an aircraft past the weight agreement drops back before it to agree the weight anew.
 */
export class LoadCommand extends SlotCommand {
  constructor(
    slotPick: number,
    stale: boolean,
    private readonly loadPick: number,
  ) {
    super(slotPick, true, 0, stale);
  }

  protected request(model: LineupModel): Request {
    const steps = model.snapshot.readinessSteps as SlotStatus[];
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => !GONE.includes(candidate.status));
    const load = LOADS[this.loadPick % LOADS.length];
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'load'),
      body: { ...this.basis(slot), ...load },
      prediction,
      token: model.people[0].token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (RECORDS_CLOSED.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    const weights = load.stores.map(({ name, count }) => (WKD_41.stores.get(name.toLowerCase()) ?? NaN) * count);
    if (weights.some(Number.isNaN)) return answer(refusal(400, 'stores_not_in_catalogue'));
    const stores = storesInWords(load);
    if (slotFacts(slot).loadBuilt && slot.fuelLb === load.fuelLb && slot.stores === stores)
      return answer(refusal(409, 'no_change'));
    const grossWeightLb = weights.reduce((sum, weight) => sum + weight, WKD_41.operatingWeightLb + load.fuelLb);
    const facts: Partial<SlotFacts> = { fuelLb: load.fuelLb, stores, grossWeightLb, loadBuilt: true };
    // The pilot answered the figure of before.
    if (grossWeightLb !== slot.grossWeightLb) facts.pilotAnswerLb = null;
    // Any load set voids a weight agreement: the aircraft goes back to the step before it.
    Object.assign(facts, droppedBack(steps, slot.status, 'weight'));
    return answer(this.accepted(model, slot, facts));
  }

  override toString(): string {
    return this.describe('load', `, load #${this.loadPick % LOADS.length}`);
  }
}

/**
 * The handler gives an aircraft a pilot (one of the cycle's, who moves from the aircraft they fly), takes
 * its pilot off, or names a person who is no pilot. Only a planned or down aircraft changes pilot, and an
 * aircraft in a catapult's order never loses its pilot.
 */
export class AssignPilotCommand extends SlotCommand {
  constructor(
    slotPick: number,
    stale: boolean,
    /** A pilot of the run by index; one past them for none, two past for a person who is not a pilot. */
    private readonly pilotPick: number,
  ) {
    super(slotPick, true, 0, stale);
  }

  /**
   * Mostly a pilot free to move (whose aircraft left its catapult's order) or none; now and then any pilot
   * of the run, none, or a person who is not a pilot.
   */
  private pilot(model: LineupModel): Person | null | 'no pilot' {
    const pilots = model.people.filter((person) => person.role === 'pilot');
    const free = pilots.filter((person) =>
      model.snapshot.slots.some(
        (slot) => slot.pilotId === person.userId && slot.catapultId === null && PILOT_CAN_CHANGE.includes(slot.status),
      ),
    );
    if (this.pilotPick % 3 !== 0) return [...free, null][this.pilotPick % (free.length + 1)];
    const pick = this.pilotPick % (pilots.length + 2);
    if (pick === pilots.length) return null;
    return pick < pilots.length ? pilots[pick] : 'no pilot';
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const slot = pickSlot(snapshot, this.slotPick, (candidate) => PILOT_CAN_CHANGE.includes(candidate.status));
    const chosen = this.pilot(model);
    const officer = model.people.find((person) => person.role === 'catapult_officer')!;
    const pilotId = chosen === 'no pilot' ? officer.userId : (chosen?.userId ?? null);
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'pilot'),
      body: { ...this.basis(slot), pilotId },
      prediction,
      token: model.people[0].token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (!PILOT_CAN_CHANGE.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    if (pilotId === slot.pilotId) return answer(refusal(409, 'no_change'));
    const off = { pilotId: null, pilotAnswerLb: null };
    if (pilotId === null) {
      if (slot.catapultId !== null) return answer(refusal(409, 'pilot_missing'));
      return answer(this.accepted(model, slot, off));
    }
    if (chosen === 'no pilot') return answer(refusal(400, 'invalid_pilot'));
    const from: SlotView | undefined = snapshot.slots.find(
      (other) => other.id !== slot.id && other.pilotId === pilotId && other.status !== 'scratched',
    );
    if (from && !PILOT_CAN_CHANGE.includes(from.status)) return answer(refusal(400, 'invalid_pilot'));
    if (from && from.catapultId !== null) return answer(refusal(409, 'pilot_missing'));
    const slots = new Map<number, Partial<SlotFacts>>([[slot.id, { pilotId, pilotAnswerLb: null }]]);
    if (from) slots.set(from.id, off);
    return answer({ status: 200, lanes: lanesOf(snapshot), slots });
  }

  override toString(): string {
    return this.describe('assign pilot', `, pilot #${this.pilotPick}`);
  }
}

/** The reason for a suspend, given after the tap by the pilot of the aircraft or an officer of its catapult. */
export class SuspendReasonCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    /** A quick choice by index; `other` comes with words on even rounds and without on odd ones. */
    private readonly reasonPick: number,
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  /** Suspends are soon resumed: mostly sent while an aircraft is suspended, now and then at any time. */
  override check(model: Readonly<LineupModel>): boolean {
    return this.slotPick % 5 === 0 || model.snapshot.slots.some((slot) => slot.status === 'suspended');
  }

  protected request(model: LineupModel): Request {
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => candidate.status === 'suspended');
    const person =
      this.personPick % 2 === 0
        ? pilotFor(model, slot, this.rightPerson, this.personPick)
        : officerFor(model, slot, this.rightPerson, this.personPick);
    const reason = SUSPEND_REASONS[this.reasonPick % SUSPEND_REASONS.length];
    const text = reason === 'other' && this.withWords ? 'Model run: tow bar' : undefined;
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'suspend-reason'),
      body: { ...this.basis(slot), reason, ...(text ? { text } : {}) },
      prediction,
      token: person.token,
    });
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (person.role === 'pilot' && person.userId !== slot.pilotId) return answer(refusal(403, 'not_your_slot'));
    if (person.role === 'catapult_officer' && person.catapultId !== slot.catapultId)
      return answer(refusal(403, 'not_your_catapult'));
    if (slot.status !== 'suspended') return answer(refusal(409, 'wrong_step'));
    if (reason === 'other' && !text) return answer(refusal(422, 'reason_required'));
    return answer(this.accepted(model, slot, { suspendReason: text ?? SUSPEND_REASON_LABELS[reason] }));
  }

  private get withWords(): boolean {
    return Math.floor(this.reasonPick / SUSPEND_REASONS.length) % 2 === 0;
  }

  override toString(): string {
    const reason = SUSPEND_REASONS[this.reasonPick % SUSPEND_REASONS.length];
    return this.describe(
      'suspend reason',
      `, ${reason}${reason === 'other' && !this.withWords ? ' without words' : ''}${this.personPick % 2 === 0 ? ', by a pilot' : ''}`,
    );
  }
}
