import type { AircraftTypeView, AircraftView, SlotStatus, SlotView } from '@catline/contracts';
import {
  type AddedSlot,
  type Lanes,
  type LineupModel,
  type LineupReal,
  ModelCommand,
  type Person,
  type Request,
  type SlotFacts,
  byId,
  cycleClosed,
  droppedBack,
  heldSpare,
  lanesOf,
  refusal,
} from './lineup-model-commands.js';
import { uploadCsv } from './csv-upload.js';

/**
 * The model's commands that bring aircraft into a launching cycle or change what its figures rest on:
 * adding an aircraft, importing an air plan, calling a spare for a down aircraft, applying a suggested
 * lineup, and a new upload of a type's approved setting tables. Each predicts from the rules as written
 * here whether the server takes it, with which refusal code, and what it leaves.
 */

/** The demo fleet and its types, read once by the spec: aircraft by side number, types with their tables. */
export interface Fleet {
  aircraft: readonly AircraftView[];
  types: readonly AircraftTypeView[];
}

/** Demo aircraft no launching cycle of the run starts with: the ones the model adds. */
const EXTRA_SIDES = ['C27', 'C28', 'C29', 'C30', 'C31', 'C32', 'D33', 'D34', 'D35', 'D36'];

const personOf = (model: LineupModel, role: Person['role']) => model.people.find((person) => person.role === role)!;

const aircraftOf = (fleet: Fleet, side: string) => fleet.aircraft.find((aircraft) => aircraft.sideNumber === side)!;

/** An extra aircraft (by `pick`) not yet in the cycle; undefined once all are in. */
function freeAircraft(model: LineupModel, pick: number): string | undefined {
  const inCycle = new Set(model.snapshot.slots.map((slot) => slot.sideNumber));
  const free = EXTRA_SIDES.filter((side) => !inCycle.has(side));
  return free.length === 0 ? undefined : free[pick % free.length];
}

/** What an aircraft starts with in the deck pool: planned, nothing answered, agreed or recorded yet. */
const added = (
  side: string,
  line: { pilotId: number | null; fuelLb: number; grossWeightLb: number; spare: boolean },
): AddedSlot => ({
  side,
  spare: line.spare,
  facts: {
    status: 'planned',
    agreedWeightLb: null,
    weightAgreed: false,
    pilotAnswerLb: null,
    reverifyCause: null,
    suspendReason: null,
    pilotId: line.pilotId,
    armState: null,
    fuelLb: line.fuelLb,
    stores: '',
    grossWeightLb: line.grossWeightLb,
    loadBuilt: false,
    waivedGates: [],
  },
});

/**
 * Air operations add an aircraft to the cycle: a free one (as a spare now and then), one already in the
 * cycle, or a free one with a pilot who already flies another aircraft of the cycle.
 */
export class AddSlotCommand extends ModelCommand {
  constructor(
    private readonly sidePick: number,
    /** 0–1: a free aircraft; 2: one already in the cycle; 3: with a pilot flying another aircraft. */
    private readonly kind: number,
    private readonly spare: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const fleet = model.fleet!;
    const kind = this.kind % 4;
    const side =
      kind === 2
        ? byId(model.snapshot)[this.sidePick % model.snapshot.slots.length].sideNumber
        : freeAircraft(model, this.sidePick);
    // A pilot flies one aircraft of a cycle at a time: down or scratched, it frees its pilot.
    const flying = byId(model.snapshot).find(
      (slot) => slot.pilotId !== null && !['down', 'scratched'].includes(slot.status),
    );
    const pilotId = kind === 3 ? (flying?.pilotId ?? null) : null;
    const line = { pilotId, fuelLb: 11_000, grossWeightLb: 44_000, spare: this.spare };
    const answer = (prediction: Request['prediction']) => ({
      path: `/api/cycles/${model.snapshot.cycle.id}/slots`,
      body: {
        aircraftId: aircraftOf(fleet, side ?? 'C21').id,
        pilotId,
        mission: 'Model run: strike',
        fuelLb: line.fuelLb,
        stores: '',
        grossWeightLb: line.grossWeightLb,
        tanker: false,
        earlyWarning: false,
        spare: this.spare,
      },
      prediction,
      token: personOf(model, 'air_operations').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (side === undefined || model.snapshot.slots.some((slot) => slot.sideNumber === side))
      return answer(refusal(409, 'aircraft_already_in_cycle'));
    if (pilotId !== null) return answer(refusal(409, 'pilot_already_assigned'));
    return answer({
      status: 200,
      answered: 201,
      lanes: lanesOf(model.snapshot),
      added: [added(side, line)],
    });
  }

  override toString(): string {
    return `add aircraft(#${this.sidePick}, ${['free', 'free', 'in the cycle', 'pilot flying'][this.kind % 4]}${this.spare ? ', spare' : ''})`;
  }
}

const AIR_PLAN_HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';

/**
 * Air operations import an air plan (preview, then confirm): one or two free aircraft, or a plan naming
 * an aircraft already in the cycle, which the preview rejects and the confirm refuses. A closed cycle
 * refuses the preview and the confirm.
 */
export class AirPlanImportCommand extends ModelCommand {
  private uploadId = 0;
  private sides: string[] = [];

  constructor(
    private readonly sidePick: number,
    private readonly two: boolean,
    /** One line names an aircraft already in the cycle. */
    private readonly taken: boolean,
    private readonly spare: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  private rejected(model: LineupModel) {
    const inCycle = new Set(model.snapshot.slots.map((slot) => slot.sideNumber));
    return this.sides.some((side) => inCycle.has(side));
  }

  protected override async prepare(model: LineupModel, real: LineupReal): Promise<void> {
    const first = freeAircraft(model, this.sidePick);
    const second = freeAircraft(model, this.sidePick + 1);
    const inCycle = byId(model.snapshot)[this.sidePick % model.snapshot.slots.length].sideNumber;
    this.sides = [this.taken || !first ? inCycle : first, ...(this.two && second && second !== first ? [second] : [])];
    const lines = this.sides.map(
      (side) => `${side},,Model run: strike,11000,,44000,no,no,${this.spare ? 'yes' : 'no'}`,
    );
    const token = real.tokens[personOf(model, 'air_operations').token];
    const response = await uploadCsv(real.url, token, `/api/cycles/${model.snapshot.cycle.id}/air-plan/preview`, {
      content: [AIR_PLAN_HEADER, ...lines].join('\n'),
      fileName: 'model-plan.csv',
    });
    // A closed cycle takes no air plan; otherwise the preview lists the problems: an aircraft already in
    // the cycle is one, and the upload is rejected.
    const closed = cycleClosed(model);
    const result = this.rejected(model) ? 'rejected' : 'accepted';
    const previewed = closed
      ? response.status === 409 && response.body.code === 'cycle_closed'
      : response.status === 200 && response.body.result === result;
    if (!previewed)
      throw new Error(
        `${this.toString()}: the preview answered ${response.status} ${response.text}, expected ${closed ? '409 cycle_closed' : result}`,
      );
    // With nothing previewed, the confirm names the first upload there is: the closed cycle is refused first.
    this.uploadId = closed ? 1 : (response.body.uploadId as number);
  }

  protected request(model: LineupModel): Request {
    const answer = (prediction: Request['prediction']) => ({
      path: `/api/cycles/${model.snapshot.cycle.id}/air-plan/imports/${this.uploadId}/confirm`,
      body: { basisVersion: model.snapshot.version - (this.stale ? 1 : 0) },
      prediction,
      token: personOf(model, 'air_operations').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.rejected(model)) return answer(refusal(409, 'upload_not_importable'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    const line = { pilotId: null, fuelLb: 11_000, grossWeightLb: 44_000, spare: this.spare };
    return answer({
      status: 200,
      lanes: lanesOf(model.snapshot),
      added: this.sides.map((side) => added(side, line)),
    });
  }

  override toString(): string {
    return `air plan(#${this.sidePick}${this.two ? ', two aircraft' : ''}${this.taken ? ', one in the cycle' : ''}${this.spare ? ', spares' : ''}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * The handler calls a spare for a down aircraft: mostly a held spare for a down aircraft, now and then
 * for an aircraft not down or one with its spare already called, or a spare not held.
 */
export class SpareCallCommand extends ModelCommand {
  constructor(
    private readonly downPick: number,
    private readonly sparePick: number,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  private pick(model: LineupModel): { down: SlotView; spare: SlotView } {
    const slots = byId(model.snapshot);
    const down = slots.filter((slot) => slot.status === 'down');
    const held = slots.filter((slot) => heldSpare(slot, model.replacedBy));
    const from = (likely: SlotView[], pick: number, otherwise: SlotView[]) =>
      likely.length > 0 && pick % 5 !== 0 ? likely[pick % likely.length] : otherwise[pick % otherwise.length];
    // Now and then for an aircraft not down (if there is one), or a spare not held aside.
    const notDown = slots.filter((slot) => slot.status !== 'down');
    return {
      down: from(down, this.downPick, notDown.length > 0 ? notDown : slots),
      spare: from(held, this.sparePick, slots),
    };
  }

  protected request(model: LineupModel): Request {
    const { down, spare } = this.pick(model);
    const answer = (prediction: Request['prediction']) => ({
      path: `/api/cycles/${model.snapshot.cycle.id}/lineup/slots/${down.id}/spare`,
      body: { slotVersion: down.version + (this.stale ? 1 : 0), spareSlotId: spare.id, spareVersion: spare.version },
      prediction,
      token: model.people[0].token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    // One spare per down aircraft, and only a spare held aside.
    if (down.status !== 'down' || model.replacedBy.has(down.id) || !heldSpare(spare, model.replacedBy))
      return answer(refusal(409, 'spare_unavailable'));
    const slots = new Map<number, Partial<SlotFacts>>();
    // The down aircraft's pilot walks to the spare; a new pilot has not answered the weight.
    if (down.pilotId !== null) {
      slots.set(down.id, { pilotId: null, pilotAnswerLb: null });
      slots.set(spare.id, { pilotId: down.pilotId, pilotAnswerLb: null });
    }
    return answer({ status: 200, lanes: lanesOf(model.snapshot), slots, replaces: { down: down.id, spare: spare.id } });
  }

  override toString(): string {
    return `spare call(down #${this.downPick}, spare #${this.sparePick}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * The handler applies a suggested lineup on the launching cycle: planned aircraft with a pilot spread
 * over the lanes (or left in the pool), now and then with an intruder: a held spare, an aircraft without a
 * pilot or one already in its steps. Aircraft in their steps or launched keep their places at the front.
 */
export class ApplySuggestionCommand extends ModelCommand {
  constructor(
    /** Per planned aircraft (by id order): a lane by its order, or past the last lane for the pool. */
    private readonly places: readonly number[],
    private readonly intruderPick: number | null,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const slots = byId(snapshot);
    const lanes: Lanes = new Map(snapshot.lanes.map((lane) => [lane.catapultId, []]));
    slots
      .filter((slot) => slot.status === 'planned' && slot.pilotId !== null && !heldSpare(slot, model.replacedBy))
      .forEach((slot, i) => {
        const place = this.places[i % this.places.length] % (snapshot.lanes.length + 1);
        if (place < snapshot.lanes.length) lanes.get(snapshot.lanes[place].catapultId)!.push(slot.id);
      });
    if (this.intruderPick !== null) {
      const intruder = slots[this.intruderPick % slots.length];
      const listed = [...lanes.values()].flat();
      if (!listed.includes(intruder.id)) lanes.get(snapshot.lanes[0].catapultId)!.push(intruder.id);
    }
    const answer = (prediction: Request['prediction']) => ({
      path: `/api/cycles/${snapshot.cycle.id}/lineup/suggestion/apply`,
      body: {
        basisVersion: snapshot.version - (this.stale ? 1 : 0),
        lanes: [...lanes].map(([catapultId, slotIds]) => ({ catapultId, slotIds })),
      },
      prediction,
      token: model.people[0].token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    const slotOf = new Map(slots.map((slot) => [slot.id, slot]));
    for (const id of [...lanes.values()].flat()) {
      const slot = slotOf.get(id)!;
      if (heldSpare(slot, model.replacedBy)) return answer(refusal(409, 'spare_held'));
      if (slot.pilotId === null) return answer(refusal(409, 'pilot_missing'));
      if (slot.status !== 'planned') return answer(refusal(400, 'invalid_lineup'));
    }
    // Launched aircraft and those in their steps hold their places ahead of the suggested ones; planned
    // aircraft of a lane the suggestion leaves out go back to the pool.
    const current = lanesOf(snapshot);
    const next: Lanes = new Map(
      [...current].map(([catapultId, ids]) => [
        catapultId,
        [...ids.filter((id) => slotOf.get(id)!.status !== 'planned'), ...lanes.get(catapultId)!],
      ]),
    );
    const same = [...next].every(
      ([catapultId, ids]) =>
        ids.length === current.get(catapultId)!.length && ids.every((id, i) => id === current.get(catapultId)![i]),
    );
    if (same) return answer(refusal(409, 'no_change'));
    return answer({ status: 200, lanes: next });
  }

  override toString(): string {
    return `apply suggestion(places ${this.places.slice(0, 8).join('')}…${this.intruderPick === null ? '' : `, intruder #${this.intruderPick}`}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * An admin uploads a type's approved setting tables again: the tables held (so the figures stay as
 * they are), or with one table given twice, which is refused. Each aircraft of the type on a launching
 * cycle past the weight agreement goes back to it for re-verify, as after a new wind; a cycle not
 * launching, or one without the type, does not change.
 */
export class LaunchDataCommand extends ModelCommand {
  constructor(
    /** The cycle's own type, or another of the ship's. */
    private readonly ownType: boolean,
    private readonly doubled: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const fleet = model.fleet!;
    const inCycle = new Set(snapshot.slots.map((slot) => slot.typeId));
    const type = fleet.types.find((candidate) => inCycle.has(candidate.id) === this.ownType) ?? fleet.types[0];
    const tables = this.doubled ? [...type.settingTables, type.settingTables[0]] : type.settingTables;
    const answer = (prediction: Request['prediction']) => ({
      path: `/api/aircraft-types/${type.id}/setting-tables`,
      method: 'PUT' as const,
      body: { tables },
      prediction,
      token: personOf(model, 'admin').token,
    });
    if (this.doubled) return answer(refusal(400, 'invalid_launch_data'));
    const launching = snapshot.cycle.state === 'executing' && inCycle.has(type.id);
    if (!launching) return answer({ status: 200, lanes: lanesOf(snapshot), changes: 0 });
    const steps = snapshot.readinessSteps as SlotStatus[];
    const slots = new Map<number, Partial<SlotFacts>>();
    for (const slot of snapshot.slots.filter((candidate) => candidate.typeId === type.id)) {
      const back = droppedBack(steps, slot.status, 'launch_data');
      if (back) slots.set(slot.id, back);
    }
    return answer({ status: 200, lanes: lanesOf(snapshot), slots });
  }

  override toString(): string {
    return `launch data(${this.ownType ? "the cycle's type" : 'another type'}${this.doubled ? ', a table twice' : ''})`;
  }
}
