import type {
  AddSlotRequest,
  AircraftView,
  CreateCycleRequest,
  CycleView,
  DeckPositionView,
  LineupCommandResult,
  LineupSnapshot,
  ReadinessStep,
  ShipView,
  SlotView,
  UserView,
} from '@catline/contracts';
import request from 'supertest';
import { readAllPages } from './paged-list.js';
import { bearer, signIn, TOKEN_RENEWAL_MS } from './sign-in.js';

export const ADMIN = 'admin@catline.example';
export const AIR_OPS = 'airops@catline.example';
export const HANDLER = 'handler@catline.example';
export const OBSERVER = 'observer@catline.example';
export const AIR_BOSS = 'airboss@catline.example';
export const deckEdgeOperator = (catapultNumber: number) => `deo${catapultNumber}@catline.example`;
export const catapultOfficer = (catapultNumber: number) => `cat${catapultNumber}@catline.example`;
/** The demo fleet's pilots: pilot(1) to pilot(DEMO_PILOTS). */
export const DEMO_PILOTS = 24;
export const pilot = (n: number) => (n === 1 ? 'pilot@catline.example' : `pilot${n}@catline.example`);

const HOUR = 3_600_000;

/** Conditions where every demo type is go from every catapult (invented; about 35 kt down the deck). */
export const goodConditions = {
  shipCourseDeg: 0,
  shipSpeedKt: 25,
  trueWindFromDeg: 0,
  trueWindSpeedKt: 10,
  temperatureC: 20,
  pressureHpa: 1013,
  weatherCase: 'I',
  night: false,
} as const;

/** The demo deck's first hangar bay, where aircraft stand side by side: none waits for another to leave. */
export const HANGAR_BAY_A: DeckPositionView = { kind: 'hangar', name: 'bay-A' };

type Method = 'get' | 'post' | 'put' | 'patch';

/** An aircraft of a lane by side number, flown by `pilotEmail` where given (else crewed when placed). */
export type LaneAircraft = string | { side: string; pilotEmail?: string };

/** Drives the API as the demo people do, for specs that need a cycle of their own. */
export class LineupDriver {
  private readonly tokens = new Map<string, { token: Promise<string>; signedInAt: number }>();
  private aircraft?: Promise<AircraftView[]>;
  private pilots?: Promise<UserView[]>;
  private ship?: Promise<ShipView>;

  /** `tokenOf` may hand over tokens the caller already holds; anyone else signs in. */
  constructor(
    readonly url: string,
    private readonly tokenOf: (email: string) => string | undefined = () => undefined,
  ) {}

  /** The caller's token when it holds one (it renews its own), else one signed in here and renewed in time. */
  token(email: string): Promise<string> {
    const held = this.tokenOf(email);
    if (held !== undefined) return Promise.resolve(held);
    const kept = this.tokens.get(email);
    if (kept && Date.now() - kept.signedInAt < TOKEN_RENEWAL_MS) return kept.token;
    const token = signIn(this.url, email);
    this.tokens.set(email, { token, signedInAt: Date.now() });
    return token;
  }

  async call(email: string, method: Method, path: string, body?: object): Promise<request.Response> {
    return this.callWith(await this.token(email), method, path, body);
  }

  /** As `call`, with a token of someone who is not a demo person. */
  async callWith(token: string, method: Method, path: string, body?: object): Promise<request.Response> {
    const pending = request(this.url)[method](path).set(bearer(token));
    return body === undefined ? pending : pending.send(body);
  }

  /** The call's body when it answers `status`; throws with the answer otherwise. */
  async ok<T>(email: string, method: Method, path: string, body?: object, status = 200): Promise<T> {
    const response = await this.call(email, method, path, body);
    if (response.status !== status) {
      throw new Error(
        `${method.toUpperCase()} ${path} as ${email} answered ${response.status}: ${JSON.stringify(response.body)}`,
      );
    }
    return response.body as T;
  }

  /** Every row of a paged list, as `email` reads it. */
  async all<T>(email: string, path: string): Promise<T[]> {
    return readAllPages<T>(this.url, await this.token(email), path);
  }

  demoShip(): Promise<ShipView> {
    this.ship ??= this.ok<ShipView[]>(OBSERVER, 'get', '/api/ships').then((ships) => ships[0]);
    return this.ship;
  }

  async catapultId(catapultNumber: number): Promise<number> {
    return (await this.demoShip()).catapults.find((catapult) => catapult.number === catapultNumber)!.id;
  }

  /** A new cycle of the demo ship in planning, starting in an hour; numbers are picked at random and retried. */
  async createCycle(overrides: Partial<CreateCycleRequest> = {}): Promise<CycleView> {
    for (;;) {
      const response = await this.call(AIR_OPS, 'post', '/api/cycles', {
        ...(await this.createCycleBody()),
        ...overrides,
      });
      if (response.status === 201) return response.body as CycleView;
      if (response.body?.code !== 'cycle_number_taken')
        throw new Error(`Creating a cycle failed: ${JSON.stringify(response.body)}`);
    }
  }

  /** A request for a new cycle of the demo ship in good conditions, starting in an hour, at a random number. */
  async createCycleBody(): Promise<CreateCycleRequest> {
    const planned = Date.now() + HOUR;
    return {
      shipId: (await this.demoShip()).id,
      number: 1000 + Math.floor(Math.random() * 8999),
      plannedLaunchAt: new Date(planned).toISOString(),
      windowStartAt: new Date(planned - HOUR / 6).toISOString(),
      windowEndAt: new Date(planned + HOUR).toISOString(),
      ...goodConditions,
    };
  }

  /** The id of an aircraft by side number; the fleet is read once, and again for one added since. */
  async aircraftId(side: string): Promise<number> {
    this.aircraft ??= this.all<AircraftView>(OBSERVER, '/api/aircraft');
    let found = (await this.aircraft).find((aircraft) => aircraft.sideNumber === side);
    if (!found) {
      this.aircraft = this.all<AircraftView>(OBSERVER, '/api/aircraft');
      found = (await this.aircraft).find((aircraft) => aircraft.sideNumber === side);
    }
    return found!.id;
  }

  /** Adds a demo aircraft to the cycle's deck pool (a strike sortie of 44,000 lb unless told otherwise). */
  async addSlot(
    cycleId: number,
    side: string,
    fields: Partial<AddSlotRequest> & { pilotEmail?: string } = {},
  ): Promise<SlotView> {
    const { pilotEmail, ...rest } = fields;
    const pilotId = pilotEmail ? await this.pilotId(pilotEmail) : null;
    const result = await this.ok<LineupCommandResult>(
      AIR_OPS,
      'post',
      `/api/cycles/${cycleId}/slots`,
      {
        aircraftId: await this.aircraftId(side),
        pilotId,
        mission: 'Strike training',
        fuelLb: 11_000,
        stores: '',
        grossWeightLb: 44_000,
        tanker: false,
        earlyWarning: false,
        spare: false,
        ...rest,
      },
      201,
    );
    return result.change.patch.slots!.find((slot) => slot.sideNumber === side)!;
  }

  /**
   * Adds a demo aircraft and tows it down to hangar bay A. Every spec shares the demo fleet, so where an
   * aircraft starts (where the latest earlier cycle left it) hangs on which specs ran before; in the bay it
   * neither blocks nor waits behind the test's other aircraft, whatever ran first.
   */
  async addSlotInHangar(
    cycleId: number,
    side: string,
    fields: Partial<AddSlotRequest> & { pilotEmail?: string } = {},
  ): Promise<SlotView> {
    const slot = await this.addSlot(cycleId, side, fields);
    if (slot.deckPosition?.kind === 'hangar') return slot;
    const towed = await this.towed(cycleId, slot.id, HANGAR_BAY_A);
    return towed.change.patch.slots!.find((candidate) => candidate.id === slot.id)!;
  }

  /** The handler tows the slot's aircraft to `to`, on the slot's latest version. */
  async tow(cycleId: number, slotId: number, to: DeckPositionView): Promise<request.Response> {
    const slot = await this.slot(cycleId, slotId);
    return this.call(HANDLER, 'post', `/api/cycles/${cycleId}/deck/tows`, { slotId, slotVersion: slot.version, to });
  }

  /** As {@link tow}, for a tow the test builds on: any answer but 200 throws. */
  async towed(cycleId: number, slotId: number, to: DeckPositionView): Promise<LineupCommandResult> {
    const response = await this.tow(cycleId, slotId, to);
    if (response.status !== 200) throw new Error(`Tow answered ${response.status}: ${JSON.stringify(response.body)}`);
    return response.body as LineupCommandResult;
  }

  /** A pilot's id from air operations' list (no sign-in as the pilot, which the login limits would slow). */
  async pilotId(email: string): Promise<number> {
    const find = async () => (await this.pilots)?.find((person) => person.email === email);
    // A pilot created after the list was read: read it again.
    if (!(await find())) this.pilots = this.all<UserView>(AIR_OPS, '/api/users/pilots');
    const found = await find();
    if (!found) throw new Error(`${email} is not an active pilot`);
    return found.id;
  }

  async me(email: string): Promise<{ id: number; catapultId: number | null }> {
    return this.ok(email, 'get', '/api/auth/me');
  }

  snapshot(cycleId: number, email = OBSERVER): Promise<LineupSnapshot> {
    return this.ok<LineupSnapshot>(email, 'get', `/api/cycles/${cycleId}/lineup`);
  }

  /**
   * Air operations gives a pilot-less aircraft a demo pilot who flies nothing else in the cycle (from the
   * last demo pilot down, clear of the first ones specs name), as it must have before it joins a lane.
   */
  async crew(cycleId: number, slotId: number): Promise<void> {
    const snapshot = await this.snapshot(cycleId);
    const slot = snapshot.slots.find((candidate) => candidate.id === slotId)!;
    if (slot.pilotId !== null) return;
    const flying = new Set(snapshot.slots.map((candidate) => candidate.pilotId));
    for (let n = DEMO_PILOTS; n >= 1; n--) {
      const id = await this.pilotId(pilot(n));
      if (flying.has(id)) continue;
      await this.ok(AIR_OPS, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/pilot`, {
        slotVersion: slot.version,
        pilotId: id,
      });
      return;
    }
    throw new Error(`no free demo pilot for cycle ${cycleId}`);
  }

  /**
   * The handler's move of a slot to the end of (or a place in) a catapult's lane, based on the current
   * snapshot; an aircraft without a pilot is crewed first.
   */
  async place(cycleId: number, slotId: number, catapultNumber: number, index?: number): Promise<LineupCommandResult> {
    await this.crew(cycleId, slotId);
    const snapshot = await this.snapshot(cycleId);
    const lane = snapshot.lanes.find((candidate) => candidate.number === catapultNumber)!;
    const slot = snapshot.slots.find((candidate) => candidate.id === slotId)!;
    return this.ok<LineupCommandResult>(HANDLER, 'post', `/api/cycles/${cycleId}/lineup/moves`, {
      slotId,
      slotVersion: slot.version,
      toCatapultId: lane.catapultId,
      toIndex: index ?? lane.slotIds.filter((id) => id !== slotId).length,
      targetLaneOrder: lane.slotIds,
    });
  }

  /**
   * The air boss starts launching the cycle, confirming a start outside its window (a spec's cycle is planned
   * an hour ahead), once every launch prerequisite is ticked. One cycle per ship launches: a cycle an earlier
   * spec left launching is stopped first.
   */
  async start(cycleId: number): Promise<LineupCommandResult> {
    await this.stopLaunching((await this.demoShip()).id);
    await this.tickPrerequisites(cycleId);
    const { version } = await this.snapshot(cycleId);
    return this.ok<LineupCommandResult>(AIR_BOSS, 'post', `/api/cycles/${cycleId}/start`, {
      basisVersion: version,
      confirmOutsideWindow: true,
    });
  }

  /**
   * A new cycle (under `conditions` where given) with the aircraft of each catapult number's lane added in
   * the order listed, then placed at the end of their lanes, then started: its slots in the order listed.
   */
  async executingCycle(
    lanes: Record<number, readonly LaneAircraft[]>,
    conditions: Partial<CreateCycleRequest> = {},
  ): Promise<{ cycle: CycleView; slots: SlotView[] }> {
    const cycle = await this.createCycle(conditions);
    const listed = Object.entries(lanes).flatMap(([number, aircraft]) =>
      aircraft.map((one) => ({ catapultNumber: Number(number), ...(typeof one === 'string' ? { side: one } : one) })),
    );
    const slots: SlotView[] = [];
    for (const { side, pilotEmail } of listed) slots.push(await this.addSlot(cycle.id, side, { pilotEmail }));
    for (const [index, { catapultNumber }] of listed.entries())
      await this.place(cycle.id, slots[index].id, catapultNumber);
    await this.start(cycle.id);
    return { cycle, slots };
  }

  /** The air boss ticks every launch prerequisite of the cycle not yet ticked. */
  async tickPrerequisites(cycleId: number): Promise<void> {
    const { cycle } = await this.snapshot(cycleId);
    for (const [index, prerequisite] of cycle.launchPrerequisites.entries()) {
      if (prerequisite.ticked) continue;
      const { version } = await this.snapshot(cycleId);
      await this.ok(AIR_BOSS, 'put', `/api/cycles/${cycleId}/prerequisites/${index + 1}`, {
        ticked: true,
        basisVersion: version,
      });
    }
  }

  /** The air boss stops whichever cycle of the ship is launching, if one is. */
  async stopLaunching(shipId: number): Promise<void> {
    const cycles = await this.all<CycleView>(OBSERVER, '/api/cycles');
    for (const cycle of cycles.filter((candidate) => candidate.shipId === shipId && candidate.state === 'executing')) {
      await this.ok(AIR_BOSS, 'post', `/api/cycles/${cycle.id}/stop`, { basisVersion: cycle.version });
    }
  }

  async slot(cycleId: number, slotId: number): Promise<SlotView> {
    return (await this.snapshot(cycleId)).slots.find((candidate) => candidate.id === slotId)!;
  }

  async acknowledgeWeight(cycleId: number, slotId: number, pilotEmail: string): Promise<LineupCommandResult> {
    const slot = await this.slot(cycleId, slotId);
    return this.ok<LineupCommandResult>(
      pilotEmail,
      'post',
      `/api/cycles/${cycleId}/lineup/slots/${slotId}/weight-ack`,
      {
        slotVersion: slot.version,
        grossWeightLb: slot.grossWeightLb,
      },
    );
  }

  /**
   * A readiness step by the catapult officer of the slot's catapult (or `by`); the raw answer. Weight
   * agreed records the pilot's answer from the tablet, else the planned weight, unless `agreedWeightLb`;
   * the setting step reads back the approved setting the snapshot shows, unless `settingReadBack`.
   */
  async step(
    cycleId: number,
    slotId: number,
    to: ReadinessStep | 'resume',
    by?: string,
    agreedWeightLb?: number,
    settingReadBack?: number,
  ): Promise<request.Response> {
    const slot = await this.slot(cycleId, slotId);
    const number = (await this.demoShip()).catapults.find((catapult) => catapult.id === slot.catapultId)?.number ?? 1;
    const weight = to === 'weight_agreed' ? (agreedWeightLb ?? slot.pilotWeightAckLb ?? slot.grossWeightLb) : undefined;
    const setting = to === 'setting_set' ? (settingReadBack ?? slot.figures?.catapultSetting) : undefined;
    return this.call(by ?? catapultOfficer(number), 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/advance`, {
      slotVersion: slot.version,
      to,
      ...(weight === undefined ? {} : { agreedWeightLb: weight }),
      ...(setting === undefined || setting === null ? {} : { settingReadBack: setting }),
    });
  }

  /** Takes the slot through its catapult's steps from where it is up to `last` (every step by default). */
  async stepThrough(cycleId: number, slotId: number, last?: ReadinessStep, by?: string): Promise<void> {
    const slot = await this.slot(cycleId, slotId);
    const { readinessSteps } = (await this.snapshot(cycleId)).lanes.find(
      (lane) => lane.catapultId === slot.catapultId,
    )!;
    const from = readinessSteps.indexOf(slot.status as ReadinessStep) + 1;
    const to = last === undefined ? readinessSteps.length - 1 : readinessSteps.indexOf(last);
    for (const step of readinessSteps.slice(from, to + 1)) {
      const response = await this.step(cycleId, slotId, step, by);
      if (response.status !== 200)
        throw new Error(`Step ${step} answered ${response.status}: ${JSON.stringify(response.body)}`);
    }
  }

  /** The pilot agrees the planned weight on the tablet, then every readiness step: ready to launch. */
  async readyToLaunch(cycleId: number, slotId: number, pilotEmail: string): Promise<SlotView> {
    await this.acknowledgeWeight(cycleId, slotId, pilotEmail);
    await this.stepThrough(cycleId, slotId);
    return this.slot(cycleId, slotId);
  }

  /** Launch as the catapult officer of the slot's catapult, or as `by`. */
  async launch(cycleId: number, slot: SlotView, idempotencyKey: string, by?: string): Promise<request.Response> {
    const number = (await this.demoShip()).catapults.find((catapult) => catapult.id === slot.catapultId)!.number;
    return this.call(by ?? catapultOfficer(number), 'post', `/api/cycles/${cycleId}/lineup/slots/${slot.id}/launch`, {
      slotVersion: slot.version,
      idempotencyKey,
    });
  }

  /** The air boss waives a soft launch gate of a slot. */
  async waive(cycleId: number, slotId: number, gate: string, reason: string): Promise<request.Response> {
    const slot = await this.slot(cycleId, slotId);
    return this.call(AIR_BOSS, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/waivers`, {
      slotVersion: slot.version,
      gate,
      reason,
    });
  }
}

/** A launch key no other request uses. */
export const launchKey = () => `test-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
