import { RETURNABLE_STATUSES, type SlotStatus, type SlotView } from '@catline/contracts';
import fc from 'fast-check';
import {
  CatapultStatusCommand,
  type LineupModel,
  MAX_DOWN,
  MarkDownCommand,
  type Request,
  type SlotFacts,
  UpAgainCommand,
  LANDING_AREA_CATAPULTS,
  cycleClosed,
  droppedBack,
  windReadingStale,
  lanesOf,
  ON_CATAPULT,
  onCatapult,
  refusal,
  slotFacts,
} from './lineup-model-commands.js';
import {
  CloseCommand,
  DeckStatusCommand,
  LandingAreaCommand,
  PrerequisiteCommand,
  RespotCommand,
  StopStartCommand,
  TowCommand,
  WaiverCommand,
  WindReadingCommand,
} from './cycle-model-commands.js';
import {
  AddSlotCommand,
  AirPlanImportCommand,
  ApplySuggestionCommand,
  LaunchDataCommand,
  SpareCallCommand,
} from './fleet-model-commands.js';
import { launchKey } from './lineup-fixtures.js';
import {
  ArmStateCommand,
  AssignPilotCommand,
  LoadCommand,
  SuspendReasonCommand,
} from './slot-record-model-commands.js';
import {
  GONE,
  SlotCommand,
  officerFor,
  pickSlot,
  pilotFor,
  placeInLane,
  notOwnCatapult,
} from './slot-model-command.js';

/**
 * The commands of a launching cycle for fast-check's model-based run: readiness steps and their undo, the
 * pilot's weight answer and the crew's agreement, suspend (and its reason) and resume, launch with its
 * gates, hangfire, cold shot, down on the catapult, return to the pool, armed or safe, fuel and stores, the
 * pilot, (from the planning model) catapult up/down, down and up again, and (cycle-model-commands.ts) the
 * commands on the cycle and its deck: wind readings, deck status, landing area, waivers, launch prerequisites,
 * stop, start and close, tows and the respot, and (fleet-model-commands.ts) an aircraft added, an air plan
 * imported, a spare called, a suggested lineup applied and new launch data. Each predicts from the rules
 * as written here (not the service's) whether the server takes it, with which refusal code, and what it
 * leaves; the model-based run checks that after every command.
 */

/** From tensioned on: the catapult can be fired, so a hangfire can be reported. */
const FIREABLE: readonly SlotStatus[] = ['tensioned', 'run_up', 'checks_clear', 'pilot_ready'];
/** The undo window is 10 s; the model stays clear of the edge, as the request's own time is unknown. */
const SURELY_IN_TIME_MS = 7_000;
const SURELY_LATE_MS = 13_000;

/** A readiness step (mostly the next one), or resume; the weight agreed is the pilot's answer, the plan, or off. */
export class StepCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    /** 0–5: the next step; 6: a step picked by `stepPick`; 7: resume. */
    private readonly kind: number,
    private readonly stepPick: number,
    /** 0: the pilot's answer (or the plan), 1: the plan, 2: 500 lb more. */
    private readonly weightPick: number,
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const steps = snapshot.readinessSteps as SlotStatus[];
    const slot = pickSlot(
      snapshot,
      this.slotPick,
      this.kind === 7 ? (candidate) => candidate.status === 'suspended' : undefined,
    );
    const person = officerFor(model, slot, this.rightPerson, this.personPick);
    const at = slot.status === 'planned' ? -1 : steps.indexOf(slot.status);
    const next = at >= 0 || slot.status === 'planned' ? (steps[at + 1] ?? null) : null;
    const to: SlotStatus | 'resume' =
      this.kind === 7 ? 'resume' : this.kind === 6 || next === null ? steps[this.stepPick % steps.length] : next;
    const { pilotAnswerLb } = slotFacts(slot);
    const weight = [pilotAnswerLb ?? slot.grossWeightLb, slot.grossWeightLb, slot.grossWeightLb + 500][
      this.weightPick % 3
    ];
    // The crew reads back the setting the station shows: the approved one for the agreed weight.
    const approvedSetting = slot.figures?.catapultSetting ?? null;
    const body = {
      ...this.basis(slot),
      to,
      ...(to === 'weight_agreed' ? { agreedWeightLb: weight } : {}),
      ...(to === 'setting_set' && approvedSetting !== null ? { settingReadBack: approvedSetting } : {}),
    };
    const path = this.path(model, slot, 'advance');
    const answer = (prediction: Request['prediction'], after?: Request['after']) => ({
      path,
      body,
      prediction,
      token: person.token,
      after,
    });
    if (notOwnCatapult(person, slot)) return answer(refusal(403, 'not_your_catapult'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (snapshot.cycle.state !== 'executing') return answer(refusal(409, 'cycle_not_executing'));
    const place = placeInLane(snapshot, slot);
    if (to === 'resume') {
      if (slot.status !== 'suspended') return answer(refusal(409, 'wrong_step'));
      // The head of the lane is hooked up again; one suspended while waiting behind it waits again.
      const back: SlotStatus = place === 0 || !steps.includes('taxiing') ? 'on_catapult' : 'taxiing';
      const facts: Partial<SlotFacts> = { status: back, agreedWeightLb: null, weightAgreed: false };
      if (back === 'on_catapult') facts.suspendReason = null;
      return answer(this.accepted(model, slot, facts));
    }
    if (to !== next) return answer(refusal(409, 'wrong_step'));
    // The next aircraft may taxi up behind the deflector; only the head of the lane goes further.
    if (place > (to === 'taxiing' ? 1 : 0)) return answer(refusal(409, 'not_current_aircraft'));
    const facts: Partial<SlotFacts> = { status: to };
    if (to === 'weight_agreed') {
      if (pilotAnswerLb !== null && pilotAnswerLb !== weight) return answer(refusal(409, 'weight_mismatch'));
      Object.assign(facts, { agreedWeightLb: weight, weightAgreed: true });
    }
    if (to === 'setting_set' && approvedSetting === null) return answer(refusal(409, 'approved_setting_missing'));
    // Reading the setting back is the re-verify.
    if (to === 'setting_set') facts.reverifyCause = null;
    if (to === 'on_catapult') facts.suspendReason = null;
    const step = { byUserId: person.userId, from: slot.status, to, reverifyBefore: slot.reverifyCause };
    return answer(this.accepted(model, slot, facts), (after, outcome) =>
      after.lastSteps.set(slot.id, { ...step, sentAt: outcome.sentAt }),
    );
  }

  override toString(): string {
    const kind = this.kind === 7 ? 'resume' : this.kind === 6 ? `step ${this.stepPick}` : 'next step';
    return this.describe(kind, `, weight #${this.weightPick % 3}`);
  }
}

export class UndoCommand extends SlotCommand {
  /** Not in the seconds around the end of the undo window, where the answer depends on the request's own time. */
  private slot(model: Readonly<LineupModel>): SlotView {
    return pickSlot(model.snapshot, this.slotPick, (slot) => model.lastSteps.get(slot.id)?.to === slot.status);
  }

  override check(model: Readonly<LineupModel>): boolean {
    const slot = this.slot(model);
    const last = model.lastSteps.get(slot.id);
    const age = last ? Date.now() - last.sentAt : 0;
    return age < SURELY_IN_TIME_MS || age > SURELY_LATE_MS;
  }

  protected request(model: LineupModel): Request {
    const slot = this.slot(model);
    const person = officerFor(model, slot, this.rightPerson, this.personPick);
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'undo'),
      body: this.basis(slot),
      prediction,
      token: person.token,
    });
    if (notOwnCatapult(person, slot)) return answer(refusal(403, 'not_your_catapult'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    const last = model.lastSteps.get(slot.id);
    if (!last || last.to !== slot.status) return answer(refusal(409, 'nothing_to_undo'));
    if (last.byUserId !== person.userId) return answer(refusal(403, 'not_your_step'));
    if (Date.now() - last.sentAt > SURELY_LATE_MS) return answer(refusal(409, 'undo_expired'));
    const facts: Partial<SlotFacts> = { status: last.from };
    if (slot.status === 'weight_agreed') Object.assign(facts, { agreedWeightLb: null, weightAgreed: false });
    if (slot.status === 'setting_set') facts.reverifyCause = last.reverifyBefore;
    return answer(this.accepted(model, slot, facts));
  }

  override toString(): string {
    return this.describe('undo');
  }
}

/** One tap by the catapult officer or by a pilot (the aircraft's own, or another). */
export class SuspendCommand extends SlotCommand {
  protected request(model: LineupModel): Request {
    const steps = model.snapshot.readinessSteps as SlotStatus[];
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => steps.includes(candidate.status));
    const byPilot = this.personPick % 2 === 0;
    const person = byPilot
      ? pilotFor(model, slot, this.rightPerson, this.personPick)
      : officerFor(model, slot, this.rightPerson, this.personPick);
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'suspend'),
      body: this.basis(slot),
      prediction,
      token: person.token,
    });
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (person.role === 'pilot' && person.userId !== slot.pilotId) return answer(refusal(403, 'not_your_slot'));
    if (person.role === 'catapult_officer' && person.catapultId !== slot.catapultId)
      return answer(refusal(403, 'not_your_catapult'));
    if (!steps.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    return answer(this.accepted(model, slot, { status: 'suspended', suspendReason: null }));
  }

  override toString(): string {
    return this.describe('suspend', this.personPick % 2 === 0 ? ', by a pilot' : '');
  }
}

/** The pilot answers the weight from the tablet: the planned figure, or one of 500 lb more. */
export class WeightAnswerCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    private readonly heavier: boolean,
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  protected request(model: LineupModel): Request {
    const steps = model.snapshot.readinessSteps as SlotStatus[];
    const slot = pickSlot(model.snapshot, this.slotPick);
    const person = pilotFor(model, slot, this.rightPerson, this.personPick);
    const weight = slot.grossWeightLb + (this.heavier ? 500 : 0);
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'weight-ack'),
      body: { ...this.basis(slot), grossWeightLb: weight },
      prediction,
      token: person.token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (person.userId !== slot.pilotId) return answer(refusal(403, 'not_your_slot'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (GONE.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    const facts: Partial<SlotFacts> = { pilotAnswerLb: weight };
    // Another figure than the one agreed: back before the agreement, to agree and read the setting back anew.
    if (slot.agreedWeightLb !== null && slot.agreedWeightLb !== weight)
      Object.assign(facts, droppedBack(steps, slot.status, 'weight'));
    return answer(this.accepted(model, slot, facts));
  }

  override toString(): string {
    return this.describe('weight answer', this.heavier ? ', 500 lb more' : '');
  }
}

/** The launch: the hard gates first (the catapult down, no weight agreed, a re-verify), then the step. */
export class LaunchCommand extends SlotCommand {
  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const steps = snapshot.readinessSteps as SlotStatus[];
    // Mostly an aircraft ready to go, or one suspended on the way (which must not go).
    const slot = pickSlot(snapshot, this.slotPick, (candidate) =>
      [steps[steps.length - 1], 'suspended'].includes(candidate.status),
    );
    const person = officerFor(model, slot, this.rightPerson, this.personPick);
    const answer = (prediction: Request['prediction'], after?: Request['after']) => ({
      path: this.path(model, slot, 'launch'),
      body: { ...this.basis(slot), idempotencyKey: launchKey() },
      prediction,
      token: person.token,
      after,
    });
    if (notOwnCatapult(person, slot)) return answer(refusal(403, 'not_your_catapult'));
    if (slot.status === 'launched') return answer(refusal(409, 'already_launched'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    // The gates in their order, hard ones first; the loads and winds of the run keep the figures' own gates open.
    const lane = snapshot.lanes.find((candidate) => candidate.catapultId === slot.catapultId)!;
    if (snapshot.cycle.state !== 'executing') return answer(refusal(409, 'cycle_not_executing'));
    if (lane.status !== 'up') return answer(refusal(409, 'catapult_down'));
    if (snapshot.cycle.landingArea !== 'clear' && LANDING_AREA_CATAPULTS.includes(lane.number))
      return answer(refusal(409, 'catapult_closed'));
    if (lane.deckHoldReason !== null) return answer(refusal(409, 'deck_not_clear'));
    if (!slotFacts(slot).weightAgreed || slot.agreedWeightLb === null) return answer(refusal(409, 'weight_not_agreed'));
    if (slot.reverifyCause !== null) return answer(refusal(409, 'reverify_required'));
    if (windReadingStale(model) && !slotFacts(slot).waivedGates.includes('wind_reading_stale'))
      return answer(refusal(409, 'wind_reading_stale'));
    if (slot.status !== steps[steps.length - 1] || placeInLane(snapshot, slot) !== 0)
      return answer(refusal(409, 'wrong_step'));
    // The last aircraft off closes the cycle.
    const closesCycle = snapshot.slots.every((other) => other.id === slot.id || GONE.includes(other.status));
    // Airborne, it no longer stands anywhere on deck.
    const airborne = { status: 'launched' as const, deckPosition: null };
    return answer({ ...this.accepted(model, slot, airborne), closesCycle }, (after) =>
      after.launches.set(lane.catapultId, [...(after.launches.get(lane.catapultId) ?? []), slot.id]),
    );
  }

  override toString(): string {
    return this.describe('launch');
  }
}

/** A hangfire, a suspected cold shot, or the aircraft unserviceable on the catapult (to the pool, or down). */
export class CatapultEventCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    private readonly event: 'hangfire' | 'cold-shot' | 'down-to-pool' | 'down',
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  /** Downs cannot be undone: a few at most, as for the handler's downs. */
  override check(model: Readonly<LineupModel>): boolean {
    return this.event !== 'down' || model.snapshot.slots.filter((slot) => slot.status === 'down').length < MAX_DOWN;
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const steps = snapshot.readinessSteps as SlotStatus[];
    const meant: Record<typeof this.event, (slot: SlotView) => boolean> = {
      hangfire: (slot) => FIREABLE.includes(slot.status),
      'cold-shot': (slot) => slot.status === 'launched',
      'down-to-pool': (slot) => slot.status === 'suspended' || ON_CATAPULT.includes(slot.status),
      down: (slot) => slot.status === 'suspended' || ON_CATAPULT.includes(slot.status),
    };
    const slot = pickSlot(snapshot, this.slotPick, meant[this.event]);
    const person = officerFor(model, slot, this.rightPerson, this.personPick);
    const action = this.event === 'hangfire' || this.event === 'cold-shot' ? this.event : 'down-on-catapult';
    const outcome =
      this.event === 'down' ? { outcome: 'down' } : this.event === 'down-to-pool' ? { outcome: 'pool' } : {};
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, action),
      body: { ...this.basis(slot), ...outcome },
      prediction,
      token: person.token,
    });
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (notOwnCatapult(person, slot)) return answer(refusal(403, 'not_your_catapult'));
    const wrongStep = answer(refusal(409, 'wrong_step'));
    if (this.event === 'hangfire') {
      if (!FIREABLE.includes(slot.status)) return wrongStep;
      return answer(this.accepted(model, slot, { status: 'suspended', suspendReason: 'hangfire' }));
    }
    const lane = snapshot.lanes.find((candidate) => candidate.catapultId === slot.catapultId)!;
    if (this.event === 'cold-shot') {
      // Reported on the catapult's last shot only; the catapult goes down and the aircraft on it is suspended.
      if (slot.status !== 'launched' || model.launches.get(lane.catapultId)?.at(-1) !== slot.id) return wrongStep;
      const onIt = onCatapult(snapshot, lane.catapultId);
      return answer({
        status: 200,
        lanes: lanesOf(snapshot),
        catapult: { id: lane.catapultId, status: 'down' },
        slots: new Map(onIt ? [[onIt.id, { status: 'suspended' as const, suspendReason: 'suspected cold shot' }]] : []),
      });
    }
    if (slot.status !== 'suspended' && (!steps.includes(slot.status) || slot.status === 'taxiing')) return wrongStep;
    const lanes = lanesOf(snapshot);
    lanes.set(
      lane.catapultId,
      lanes.get(lane.catapultId)!.filter((id) => id !== slot.id),
    );
    return answer(
      this.accepted(
        model,
        slot,
        {
          status: this.event === 'down' ? 'down' : 'planned',
          agreedWeightLb: null,
          weightAgreed: false,
          reverifyCause: null,
          suspendReason: null,
        },
        lanes,
      ),
    );
  }

  override toString(): string {
    return this.describe(this.event);
  }
}

/** A taxiing or on-catapult aircraft back to the deck pool: by its officer, or by the handler with agreement. */
export class ReturnToPoolCommand extends SlotCommand {
  constructor(
    slotPick: number,
    rightPerson: boolean,
    personPick: number,
    stale: boolean,
    /** 0: by an officer; 1: by the handler with the officer's agreement; 2: by the handler without. */
    private readonly by: number,
  ) {
    super(slotPick, rightPerson, personPick, stale);
  }

  protected request(model: LineupModel): Request {
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => RETURNABLE_STATUSES.includes(candidate.status));
    const by = this.by % 3;
    const person = by === 0 ? officerFor(model, slot, this.rightPerson, this.personPick) : model.people[0];
    const answer = (prediction: Request['prediction']) => ({
      path: this.path(model, slot, 'return'),
      body: {
        ...this.basis(slot),
        reason: 'Model run: fuel leak',
        ...(by === 1 ? { catapultOfficerAgreed: true } : {}),
      },
      prediction,
      token: person.token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (slot.catapultId === null) return answer(refusal(409, 'no_change'));
    if (by === 0 && person.catapultId !== slot.catapultId) return answer(refusal(403, 'not_your_catapult'));
    if (by === 2) return answer(refusal(403, 'agreement_required'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (!RETURNABLE_STATUSES.includes(slot.status)) return answer(refusal(409, 'wrong_step'));
    const lanes = lanesOf(model.snapshot);
    lanes.set(
      slot.catapultId,
      lanes.get(slot.catapultId)!.filter((id) => id !== slot.id),
    );
    // It keeps its pilot's answer and the agreed figure; the crew's agreement is to be made again.
    return answer(this.accepted(model, slot, { status: 'planned', weightAgreed: false, suspendReason: null }, lanes));
  }

  override toString(): string {
    return this.describe(
      'return to pool',
      [', by an officer', ', by the handler, agreed', ', by the handler'][this.by % 3],
    );
  }
}

/** fast-check's commands for a launching cycle; the model's first person is the handler (token 0). */
const slotPick = fc.nat();
const mostlyTrue = fc.nat(7).map((n) => n !== 0);

export function executingModelCommands(maxCommands: number) {
  const slot = slotPick;
  const mostly = mostlyTrue;
  const sometimes = fc.nat(9).map((n) => n === 0);
  const crew = <T>(build: (slotPick: number, right: boolean, personPick: number, stale: boolean) => T) =>
    fc.tuple(slot, mostly, fc.nat(), sometimes).map(([s, right, person, stale]) => build(s, right, person, stale));
  return fc.commands(
    [
      fc.oneof(
        {
          weight: 80,
          arbitrary: fc
            .tuple(slot, mostly, fc.nat(), sometimes, fc.nat(7), fc.nat(), fc.nat(2))
            .map((args) => new StepCommand(...args)),
        },
        { weight: 3, arbitrary: crew((...args) => new UndoCommand(...args)) },
        { weight: 2, arbitrary: crew((...args) => new SuspendCommand(...args)) },
        {
          weight: 3,
          arbitrary: fc
            .tuple(slot, mostly, fc.nat(), sometimes, sometimes)
            .map((args) => new WeightAnswerCommand(...args)),
        },
        { weight: 6, arbitrary: crew((...args) => new LaunchCommand(...args)) },
        {
          weight: 2,
          arbitrary: fc
            .tuple(
              slot,
              mostly,
              fc.nat(),
              sometimes,
              fc.constantFrom('hangfire', 'cold-shot', 'down-to-pool', 'down') as fc.Arbitrary<
                'hangfire' | 'cold-shot' | 'down-to-pool' | 'down'
              >,
            )
            .map((args) => new CatapultEventCommand(...args)),
        },
        {
          weight: 1,
          arbitrary: fc
            .tuple(slot, mostly, fc.nat(), sometimes, fc.nat(2))
            .map((args) => new ReturnToPoolCommand(...args)),
        },
        {
          weight: 1,
          arbitrary: fc
            .tuple(fc.nat(), sometimes, fc.boolean())
            .map(([lane, stale, confirm]) => new CatapultStatusCommand(0, lane, stale, confirm)),
        },
        {
          weight: 2,
          arbitrary: fc
            .tuple(fc.nat(), sometimes, fc.constant(false))
            .map(([s, stale, spare]) => new MarkDownCommand(0, s, stale, spare)),
        },
        {
          weight: 1,
          arbitrary: fc.tuple(fc.nat(), sometimes).map(([s, stale]) => new UpAgainCommand(0, s, stale)),
        },
        {
          weight: 2,
          arbitrary: fc
            .tuple(slot, mostly, fc.nat(), sometimes, fc.boolean(), fc.boolean())
            .map((args) => new ArmStateCommand(...args)),
        },
        {
          weight: 2,
          arbitrary: fc.tuple(slot, sometimes, fc.nat()).map((args) => new LoadCommand(...args)),
        },
        {
          weight: 2,
          arbitrary: fc.tuple(slot, sometimes, fc.nat()).map((args) => new AssignPilotCommand(...args)),
        },
        {
          weight: 4,
          arbitrary: fc
            .tuple(slot, mostly, fc.nat(), sometimes, fc.nat())
            .map((args) => new SuspendReasonCommand(...args)),
        },
        ...cycleCommands(sometimes),
      ),
    ],
    { maxCommands, size: 'max' },
  );
}

/** The commands on the cycle and its deck, by the air boss, air operations and the handler. */
function cycleCommands(sometimes: fc.Arbitrary<boolean>) {
  return [
    {
      weight: 4,
      arbitrary: fc.tuple(fc.nat(), fc.boolean(), sometimes).map((args) => new WindReadingCommand(...args)),
    },
    {
      weight: 3,
      arbitrary: fc.tuple(fc.nat(), fc.boolean(), sometimes, sometimes).map((args) => new DeckStatusCommand(...args)),
    },
    {
      weight: 2,
      arbitrary: fc.tuple(fc.nat(), fc.boolean(), sometimes).map((args) => new LandingAreaCommand(...args)),
    },
    {
      weight: 4,
      arbitrary: fc.tuple(slotPick, mostlyTrue, sometimes).map((args) => new WaiverCommand(...args)),
    },
    {
      weight: 2,
      arbitrary: fc.tuple(fc.nat(), fc.boolean(), sometimes).map((args) => new PrerequisiteCommand(...args)),
    },
    {
      weight: 2,
      arbitrary: fc.tuple(mostlyTrue, mostlyTrue, sometimes).map((args) => new StopStartCommand(...args)),
    },
    { weight: 1, arbitrary: sometimes.map((stale) => new CloseCommand(stale)) },
    {
      weight: 3,
      // Half of them to a deck spot, the only tows the model sees accepted.
      arbitrary: fc
        .tuple(slotPick, fc.oneof(fc.nat(), fc.constant(3)), sometimes, fc.nat())
        .map((args) => new TowCommand(...args)),
    },
    { weight: 1, arbitrary: fc.tuple(fc.boolean(), sometimes).map((args) => new RespotCommand(...args)) },
    ...fleetCommands(sometimes),
  ];
}

/** Aircraft into the cycle (one by one, by air plan, a spare called), a suggested lineup, new launch data. */
function fleetCommands(sometimes: fc.Arbitrary<boolean>) {
  return [
    {
      weight: 3,
      // Mostly as a spare, so that the spare calls find one held aside.
      arbitrary: fc.tuple(fc.nat(), fc.nat(3), mostlyTrue).map((args) => new AddSlotCommand(...args)),
    },
    {
      weight: 1,
      arbitrary: fc
        .tuple(fc.nat(), fc.boolean(), sometimes, mostlyTrue, sometimes)
        .map((args) => new AirPlanImportCommand(...args)),
    },
    {
      weight: 4,
      arbitrary: fc.tuple(slotPick, slotPick, sometimes).map((args) => new SpareCallCommand(...args)),
    },
    {
      weight: 2,
      arbitrary: fc
        .tuple(fc.array(fc.nat(), { minLength: 1, maxLength: 12 }), fc.option(fc.nat(), { freq: 4 }), sometimes)
        .map((args) => new ApplySuggestionCommand(...args)),
    },
    {
      weight: 1,
      arbitrary: fc
        .tuple(
          mostlyTrue,
          fc.nat(3).map((n) => n === 0),
        )
        .map((args) => new LaunchDataCommand(...args)),
    },
  ];
}
