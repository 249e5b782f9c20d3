import type { LandingAreaState, SlotStatus, SlotView } from '@catline/contracts';
import {
  type LineupModel,
  ModelCommand,
  type Person,
  type Request,
  type SlotFacts,
  byId,
  cycleClosed,
  droppedBack,
  lanesOf,
  refusal,
  slotFacts,
  windReadingStale,
} from './lineup-model-commands.js';
import { GONE, pickSlot } from './slot-model-command.js';

/**
 * The model's commands on the cycle and its deck rather than on one aircraft's steps: wind readings, the
 * air boss's deck status per catapult and waivers, the landing area, launch prerequisites, stop, start
 * and close, tows and the respot. Each predicts from the rules as written here whether the server takes
 * it, with which refusal code, and what it leaves (the cycle's facts, each lane's pause and hold, each
 * slot's facts); the model-based run checks that after every command.
 *
 * Launch figures are not modelled: the run keeps to loads and winds under which they stay go (the wind
 * only ever freshens from the cycle's 10 kt), so a wind reading is checked for what it does apart from the
 * figures (the reading in force, and every agreed aircraft back to the agreement until the setting is
 * read back), and a waiver of the figures' own soft gate is predicted refused as nothing to waive.
 */

/** The person of a role among the run's people (the model's first officer for a catapult officer). */
const personOf = (model: LineupModel, role: Person['role']) => model.people.find((person) => person.role === role)!;

const cyclePath = (model: LineupModel, rest: string) => `/api/cycles/${model.snapshot.cycle.id}/${rest}`;

/** The basis of a command on the cycle: its version, or (stale) the one before. */
const basisVersion = (model: LineupModel, stale: boolean) => model.snapshot.version - (stale ? 1 : 0);

/** Accepted, leaving every lane and slot as it is unless told. */
const acceptedOnCycle = (model: LineupModel, rest: Partial<Extract<Request['prediction'], { status: 200 }>>) => ({
  status: 200 as const,
  lanes: lanesOf(model.snapshot),
  ...rest,
});

const SECOND = 1_000;
const MINUTE = 60 * SECOND;
/** The cycle's wind as the fixtures create it (goodConditions), and a fresher one. */
const WIND_SPEEDS_KT = [10, 14];

/**
 * Air operations enter a wind reading (true wind from dead ahead) taken a second ago, or 40 minutes ago
 * (past the ship's 30-minute age). A new wind takes every aircraft past the weight agreement back to it
 * for re-verify; the same wind read again only renews the reading, and is accepted even when it names the
 * instant of the reading before.
 */
export class WindReadingCommand extends ModelCommand {
  constructor(
    private readonly speedPick: number,
    private readonly old: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const speed = WIND_SPEEDS_KT[this.speedPick % WIND_SPEEDS_KT.length];
    const now = Math.floor(Date.now() / SECOND) * SECOND;
    const readAt = new Date(now - (this.old ? 40 * MINUTE : SECOND)).toISOString();
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, 'conditions'),
      method: 'PATCH' as const,
      body: {
        basisVersion: basisVersion(model, this.stale),
        trueWindFromDeg: 0,
        trueWindSpeedKt: speed,
        windReadAt: readAt,
      },
      prediction,
      token: personOf(model, 'air_operations').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    // Every reading is a change, even one of the same wind at the same instant (the service's rule).
    const newWind = speed !== snapshot.cycle.trueWindSpeedKt;
    const slots = new Map<number, Partial<SlotFacts>>();
    const steps = snapshot.readinessSteps as SlotStatus[];
    for (const slot of newWind ? snapshot.slots : []) {
      const back = droppedBack(steps, slot.status, 'wind');
      if (back) slots.set(slot.id, back);
    }
    return answer(acceptedOnCycle(model, { cycle: { windReadAt: readAt, windKt: speed }, slots }));
  }

  override toString(): string {
    return `wind reading(${WIND_SPEEDS_KT[this.speedPick % WIND_SPEEDS_KT.length]} kt${this.old ? ', 40 min old' : ''}${this.stale ? ', stale' : ''})`;
  }
}

/** The air boss holds a catapult (not clear, with a reason) or clears it; now and then a catapult of no ship's. */
export class DeckStatusCommand extends ModelCommand {
  constructor(
    private readonly lanePick: number,
    private readonly clear: boolean,
    private readonly stale: boolean,
    private readonly unknownCatapult: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { lanes } = model.snapshot;
    const lane = lanes[this.lanePick % lanes.length];
    const catapultId = this.unknownCatapult
      ? Math.max(...lanes.map((one) => one.catapultId)) + 10_000
      : lane.catapultId;
    const reason = this.clear ? null : 'Model run: FOD walk';
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, 'deck/catapult-status'),
      body: {
        catapultId,
        clear: this.clear,
        ...(reason ? { reason } : {}),
        basisVersion: basisVersion(model, this.stale),
      },
      prediction,
      token: personOf(model, 'air_boss').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (this.unknownCatapult) return answer(refusal(404, 'not_found'));
    if (lane.deckHoldReason === reason) return answer(refusal(409, 'no_change'));
    return answer(acceptedOnCycle(model, { deckHold: { catapultId, reason } }));
  }

  override toString(): string {
    return `deck status(lane #${this.lanePick}, ${this.clear ? 'clear' : 'hold'}${this.unknownCatapult ? ', unknown catapult' : ''}${this.stale ? ', stale' : ''})`;
  }
}

const LANDING_AREA: readonly LandingAreaState[] = ['clear', 'recovering', 'fouled'];

/** The air boss or the handler sets the landing area: clear, recovering, or fouled with a reason. */
export class LandingAreaCommand extends ModelCommand {
  constructor(
    private readonly statePick: number,
    private readonly byHandler: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const state = LANDING_AREA[this.statePick % LANDING_AREA.length];
    const reason = state === 'fouled' ? 'Model run: arresting wire down' : null;
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, 'deck/landing-area'),
      body: { state, ...(reason ? { reason } : {}), basisVersion: basisVersion(model, this.stale) },
      prediction,
      token: (this.byHandler ? model.people[0] : personOf(model, 'air_boss')).token,
    });
    const { cycle } = model.snapshot;
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (cycle.landingArea === state && cycle.landingAreaReason === reason) return answer(refusal(409, 'no_change'));
    // The catapults inside the landing area pause unless it is clear (the lanes' `closed`, worked out per lane).
    return answer(acceptedOnCycle(model, { cycle: { landingArea: state, landingAreaReason: reason } }));
  }

  override toString(): string {
    return `landing area(${LANDING_AREA[this.statePick % LANDING_AREA.length]}${this.byHandler ? ', by the handler' : ''}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * The air boss waives a soft gate for one aircraft: the stale wind reading, only while the reading is
 * stale and the aircraft is on a catapult and not launched; the low excess wind, which the run's figures
 * never close, is never there to waive.
 */
export class WaiverCommand extends ModelCommand {
  constructor(
    private readonly slotPick: number,
    private readonly windGate: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const slot = pickSlot(model.snapshot, this.slotPick, (candidate) => candidate.catapultId !== null);
    const gate = this.windGate ? 'wind_reading_stale' : 'excess_below_recommended';
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, `lineup/slots/${slot.id}/waivers`),
      body: { slotVersion: slot.version + (this.stale ? 1 : 0), gate, reason: 'Model run: reading due' },
      prediction,
      token: personOf(model, 'air_boss').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    const open = this.windGate && windReadingStale(model) && slot.catapultId !== null && slot.status !== 'launched';
    if (!open) return answer(refusal(409, 'nothing_to_waive'));
    const waivedGates = [...new Set([...slotFacts(slot).waivedGates, gate])].sort();
    return answer(acceptedOnCycle(model, { slots: new Map([[slot.id, { waivedGates }]]) }));
  }

  override toString(): string {
    return `waiver(slot #${this.slotPick}, ${this.windGate ? 'stale wind' : 'low excess'}${this.stale ? ', stale' : ''})`;
  }
}

/** The air boss ticks or unticks a launch prerequisite (by its number, now and then one the ship has not). */
export class PrerequisiteCommand extends ModelCommand {
  constructor(
    private readonly numberPick: number,
    private readonly ticked: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { cycle } = model.snapshot;
    const count = cycle.launchPrerequisites.length;
    const number = (this.numberPick % (count + 1)) + 1;
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, `prerequisites/${number}`),
      method: 'PUT' as const,
      body: { ticked: this.ticked, basisVersion: basisVersion(model, this.stale) },
      prediction,
      token: personOf(model, 'air_boss').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (number > count) return answer(refusal(404, 'not_found'));
    if (cycle.state !== 'planning') return answer(refusal(409, 'wrong_state'));
    const ticked = cycle.launchPrerequisites.map((prerequisite) => prerequisite.ticked);
    if (ticked[number - 1] === this.ticked) return answer(refusal(409, 'no_change'));
    ticked[number - 1] = this.ticked;
    return answer(acceptedOnCycle(model, { cycle: { ticked } }));
  }

  override toString(): string {
    return `prerequisite(#${this.numberPick}, ${this.ticked ? 'tick' : 'untick'}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * The air boss stops launching (back to planning) or starts again: only with every prerequisite ticked,
 * and, since the run's cycles start before their window, only when told to start outside it.
 */
export class StopStartCommand extends ModelCommand {
  constructor(
    /** Mostly start (refused while launching), so that a stopped cycle soon launches again. */
    private readonly start: boolean,
    private readonly confirmOutsideWindow: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const { cycle } = model.snapshot;
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, this.start ? 'start' : 'stop'),
      body: {
        basisVersion: basisVersion(model, this.stale),
        ...(this.start ? { confirmOutsideWindow: this.confirmOutsideWindow } : {}),
      },
      prediction,
      token: personOf(model, 'air_boss').token,
    });
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (cycle.state !== (this.start ? 'planning' : 'executing')) return answer(refusal(409, 'wrong_state'));
    if (!this.start) return answer(acceptedOnCycle(model, { cycle: { state: 'planning' } }));
    if (cycle.launchPrerequisites.some((prerequisite) => !prerequisite.ticked))
      return answer(refusal(409, 'prerequisites_not_ticked'));
    if (Date.now() < Date.parse(cycle.windowStartAt) && !this.confirmOutsideWindow)
      return answer(refusal(409, 'outside_window'));
    return answer(acceptedOnCycle(model, { cycle: { state: 'executing' } }));
  }

  override toString(): string {
    return `${this.start ? `start${this.confirmOutsideWindow ? ' outside the window' : ''}` : 'stop'}(${this.stale ? 'stale' : ''})`;
  }
}

/** Past this many commands a run may close its cycle: everything after it is refused, so not too soon. */
const CLOSE_AFTER = 40;

/** Air operations close the cycle: every aircraft not launched, down or scratched is scratched off its lane. */
export class CloseCommand extends ModelCommand {
  constructor(private readonly stale: boolean) {
    super(0);
  }

  override check(model: Readonly<LineupModel>): boolean {
    return model.outcomes.length >= CLOSE_AFTER;
  }

  protected request(model: LineupModel): Request {
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, 'close'),
      body: { basisVersion: basisVersion(model, this.stale) },
      prediction,
      token: personOf(model, 'air_operations').token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    const scratched = byId(model.snapshot).filter((slot) => !GONE.includes(slot.status));
    const lanes = lanesOf(model.snapshot);
    for (const [catapultId, ids] of lanes)
      lanes.set(
        catapultId,
        ids.filter((id) => !scratched.some((slot) => slot.id === id)),
      );
    const slots = new Map<number, Partial<SlotFacts>>(scratched.map((slot) => [slot.id, { status: 'scratched' }]));
    return answer({ status: 200, lanes, slots, cycle: { state: 'closed' } });
  }

  override toString(): string {
    return `close(${this.stale ? 'stale' : ''})`;
  }
}

/** Planned, down or scratched: on its position. One taxiing or further is at its catapult, one launched airborne. */
const holdsPosition = (slot: SlotView) => ['planned', 'down', 'scratched'].includes(slot.status);

/**
 * The demo ship's deck spots and the two that wait behind another (demo-fleet.ts, demoDeckSpots: aft-4
 * waits for aft-3, stern-2 for stern-1): a tow from or to one of those needs the spot in front clear.
 */
const DEMO_SPOTS = [1, 2, 3, 4].flatMap((n) => [`bow-${n}`, `mid-${n}`, `aft-${n}`]).concat(['stern-1', 'stern-2']);
const SPOT_IN_FRONT: Readonly<Record<string, string>> = { 'aft-4': 'aft-3', 'stern-2': 'stern-1' };

const TOW_TARGETS = ['where it stands', "another's position", 'no such spot', 'a deck spot'];

/**
 * The handler tows an aircraft: to where it stands, to a position held by another aircraft, to a spot the
 * ship has not, or from a deck spot to one of the demo deck's spots. The last one the model decides from
 * the demo deck as the fixture lays it out (a spot held by another aircraft is occupied; a spot behind
 * another waits for it to be clear, on either end of the tow); ways through an elevator to or from the
 * hangar are launch-math's tow model, which the model does not have, so those it never sends.
 */
export class TowCommand extends ModelCommand {
  constructor(
    private readonly slotPick: number,
    /** 0: where it stands; 1: another aircraft's position; 2: a spot the ship has not; 3: a deck spot. */
    private readonly targetPick: number,
    private readonly stale: boolean,
    private readonly spotPick = 0,
  ) {
    super(0);
  }

  private slot(model: Readonly<LineupModel>): SlotView {
    return pickSlot(model.snapshot, this.slotPick, holdsPosition);
  }

  /** A tow to a deck spot starts on a deck spot, or is refused before its way matters. */
  override check(model: Readonly<LineupModel>): boolean {
    const slot = this.slot(model);
    return this.targetPick % 4 !== 3 || !holdsPosition(slot) || slot.deckPosition?.kind === 'spot';
  }

  protected request(model: LineupModel): Request {
    const { snapshot } = model;
    const slot = this.slot(model);
    const held = (other: SlotView) =>
      other.id !== slot.id &&
      holdsPosition(other) &&
      other.deckPosition !== null &&
      other.deckPosition.kind !== 'hangar';
    const other = byId(snapshot).find(
      (candidate) => held(candidate) && slotFacts(candidate).deckPosition !== slotFacts(slot).deckPosition,
    );
    const target = this.targetPick % 4;
    const to =
      target === 3
        ? { kind: 'spot', name: DEMO_SPOTS[this.spotPick % DEMO_SPOTS.length] }
        : target === 0 || (target === 1 && !other)
          ? (slot.deckPosition ?? { kind: 'spot', name: 'model-z1' })
          : target === 1
            ? other!.deckPosition!
            : { kind: 'spot', name: 'model-z9' };
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, 'deck/tows'),
      body: { slotId: slot.id, to, slotVersion: slot.version + (this.stale ? 1 : 0) },
      prediction,
      token: model.people[0].token,
    });
    if (cycleClosed(model)) return answer(refusal(409, 'cycle_closed'));
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (!holdsPosition(slot)) return answer(refusal(409, 'slot_not_movable'));
    if (to.name.startsWith('model-')) return answer(refusal(400, 'unknown_position'));
    const words = (position: { kind: string; name: string }) => `${position.kind} ${position.name}`;
    if (slotFacts(slot).deckPosition === words(to)) return answer(refusal(409, 'no_change'));
    const holds = (position: string) =>
      byId(snapshot).some((one) => held(one) && slotFacts(one).deckPosition === position);
    if (holds(words(to))) return answer(refusal(409, 'position_occupied'));
    // Only a tow between deck spots gets here with a way to weigh (check): the spot in front of either end.
    const waits = [slot.deckPosition!.name, to.name].some(
      (spot) => SPOT_IN_FRONT[spot] !== undefined && holds(`spot ${SPOT_IN_FRONT[spot]}`),
    );
    if (waits) return answer(refusal(409, 'path_blocked'));
    return answer(acceptedOnCycle(model, { slots: new Map([[slot.id, { deckPosition: words(to) }]]) }));
  }

  override toString(): string {
    const target = TOW_TARGETS[this.targetPick % 4];
    return `tow(slot #${this.slotPick}, ${target}${this.targetPick % 4 === 3 ? ` ${DEMO_SPOTS[this.spotPick % DEMO_SPOTS.length]}` : ''}${this.stale ? ', stale' : ''})`;
  }
}

/**
 * The handler builds the respot for the recovery (no targets: every aircraft stays where it is), which
 * waits until no aircraft is left on a catapult's order to launch, or ticks off its first tow (of none).
 */
export class RespotCommand extends ModelCommand {
  constructor(
    private readonly tick: boolean,
    private readonly stale: boolean,
  ) {
    super(0);
  }

  protected request(model: LineupModel): Request {
    const answer = (prediction: Request['prediction']) => ({
      path: cyclePath(model, this.tick ? 'deck/respot/tows/1' : 'deck/respot'),
      body: { basisVersion: basisVersion(model, this.stale), ...(this.tick ? {} : { targets: [] }) },
      prediction,
      token: model.people[0].token,
    });
    if (this.stale) return answer(refusal(409, 'stale_basis'));
    if (this.tick) return answer(refusal(404, 'not_found'));
    const pending = model.snapshot.slots.some((slot) => slot.catapultId !== null && !GONE.includes(slot.status));
    if (pending) return answer(refusal(409, 'launches_pending'));
    return answer(acceptedOnCycle(model, { cycle: { respot: { targets: 0, tows: 0 } } }));
  }

  override toString(): string {
    return `respot(${this.tick ? 'tick tow 1' : 'build'}${this.stale ? ', stale' : ''})`;
  }
}
