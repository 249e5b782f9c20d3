import type {
  ChangeActor,
  CycleConditions,
  LineupSnapshot,
  ReadinessStep,
  SlotView,
  WindReadingFields,
} from '@catline/contracts';
import type { DataSource } from 'typeorm';
import { AuditTrail } from '../../audit/audit-trail.service.js';
import { toAuthenticatedUser } from '../../auth/session.mapper.js';
import type { AuthenticatedUser } from '../../common/authenticated-user.js';
import { CycleCommandsService } from '../../cycles/cycle-commands.service.js';
import { CyclesService } from '../../cycles/cycles.service.js';
import { LaunchPrerequisitesService } from '../../cycles/launch-prerequisites.service.js';
import type { CreateCycleDto } from '../../cycles/dto/create-cycle.dto.js';
import { BasisChecks } from '../../cycle-changes/basis-checks.service.js';
import { LineupChangeFeed } from '../../cycle-changes/change-feed.service.js';
import { Clock } from '../../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../../cycle-changes/cycle-change.service.js';
import { LineupStateCache } from '../../cycle-changes/lineup-state.cache.js';
import { CycleClosing } from '../../cycles/cycle-closing.service.js';
import { LineupChangesService } from '../../cycle-changes/lineup-changes.service.js';
import { LineupCommandsService } from '../../lineup/lineup-commands.service.js';
import { LineupSnapshotService } from '../../cycle-changes/lineup-snapshot.service.js';
import { LineupStateLoader } from '../../cycle-changes/lineup-state.js';
import { ReadinessService } from '../../lineup/readiness.service.js';
import { MailOutbox } from '../../mail/mail-outbox.service.js';
import { User } from '../entities/user.entity.js';
import { WHOLE_FLEET } from '../../common/ship-scope.js';

/** A clock the demo sets, so the history it builds carries the times of an invented flying day. */
export class SetClock extends Clock {
  constructor(public at: Date) {
    super();
  }

  now(): Date {
    return new Date(this.at);
  }

  advance(seconds: number): void {
    this.at = new Date(this.at.getTime() + seconds * 1000);
  }
}

export interface DemoSortie {
  side: string;
  mission: string;
  grossWeightLb: number;
  fuelLb: number;
  stores?: string;
  pilot?: string;
  tanker?: boolean;
  earlyWarning?: boolean;
  spare?: boolean;
}

/**
 * Drives the real cycle and lineup services outside the app, so every demo cycle, its lineup and its
 * change log come from the same commands the people use, and the log replays to the final state.
 */
export class DemoDeck {
  readonly clock: SetClock;
  private readonly cycles: CyclesService;
  private readonly cycleCommands: CycleCommandsService;
  private readonly prerequisites: LaunchPrerequisitesService;
  private readonly lineup: LineupCommandsService;
  private readonly readiness: ReadinessService;
  private readonly snapshots: LineupSnapshotService;

  private constructor(
    private readonly dataSource: DataSource,
    private readonly people: Map<string, AuthenticatedUser>,
    start: Date,
  ) {
    this.clock = new SetClock(start);
    const loader = new LineupStateLoader();
    const log = new LineupChangesService(dataSource);
    const changes = new CycleChangeService(
      dataSource,
      loader,
      new LineupStateCache(dataSource, true),
      new LineupChangeFeed(log),
      this.clock,
    );
    const basis = new BasisChecks(log);
    const closing = new CycleClosing(new MailOutbox());
    this.cycles = new CyclesService(dataSource, new AuditTrail(), this.clock);
    this.cycleCommands = new CycleCommandsService(changes, basis, closing, this.clock);
    this.prerequisites = new LaunchPrerequisitesService(changes, basis, this.clock);
    this.lineup = new LineupCommandsService(changes, basis, this.clock);
    this.readiness = new ReadinessService(changes, basis, log, closing, this.clock);
    this.snapshots = new LineupSnapshotService(dataSource, loader, this.clock);
  }

  static async open(dataSource: DataSource, start: Date): Promise<DemoDeck> {
    const users = await dataSource.manager.find(User);
    return new DemoDeck(dataSource, new Map(users.map((user) => [user.email, toAuthenticatedUser(user)])), start);
  }

  person(email: string): AuthenticatedUser {
    const person = this.people.get(email);
    if (!person) throw new Error(`The demo has no ${email}`);
    return person;
  }

  actor(email: string): ChangeActor {
    return actorOf(this.person(email));
  }

  async createCycle(request: CreateCycleDto): Promise<number> {
    return (await this.cycles.create(WHOLE_FLEET, request)).id;
  }

  /** Air operations enters a wind reading (the ship's wind figures read again count as a new one). */
  async readWind(cycleId: number, by: string, reading: WindReadingFields & Partial<CycleConditions>): Promise<void> {
    const { version } = (await this.snapshot(cycleId)).cycle;
    await this.cycleCommands.updateConditions(cycleId, this.actor(by), { basisVersion: version, ...reading });
  }

  snapshot(cycleId: number): Promise<LineupSnapshot> {
    return this.snapshots.snapshot(cycleId);
  }

  async slot(cycleId: number, side: string): Promise<SlotView> {
    const slot = (await this.snapshot(cycleId)).slots.find((view) => view.sideNumber === side);
    if (!slot) throw new Error(`Cycle ${cycleId} has no ${side}`);
    return slot;
  }

  async add(cycleId: number, by: string, sortie: DemoSortie): Promise<void> {
    const aircraft = await this.dataSource.query<{ id: number }[]>('SELECT id FROM aircraft WHERE side_number = ?', [
      sortie.side,
    ]);
    await this.cycleCommands.addSlot(cycleId, this.actor(by), {
      aircraftId: aircraft[0].id,
      pilotId: sortie.pilot ? this.person(sortie.pilot).id : null,
      mission: sortie.mission,
      fuelLb: sortie.fuelLb,
      stores: sortie.stores ?? '',
      grossWeightLb: sortie.grossWeightLb,
      tanker: sortie.tanker ?? false,
      earlyWarning: sortie.earlyWarning ?? false,
      spare: sortie.spare ?? false,
    });
  }

  /** Moves an aircraft to a catapult (by number) at an index, as the handler drags it. */
  async move(cycleId: number, by: string, side: string, catapultNumber: number, index: number): Promise<void> {
    const snapshot = await this.snapshot(cycleId);
    const slot = snapshot.slots.find((view) => view.sideNumber === side)!;
    const lane = snapshot.lanes.find((view) => view.number === catapultNumber)!;
    await this.lineup.move(cycleId, this.actor(by), {
      slotId: slot.id,
      slotVersion: slot.version,
      toCatapultId: lane.catapultId,
      toIndex: index,
      targetLaneOrder: lane.slotIds,
    });
  }

  async markDown(cycleId: number, by: string, side: string, spareSide: string): Promise<void> {
    const slot = await this.slot(cycleId, side);
    const spare = await this.slot(cycleId, spareSide);
    await this.lineup.markDown(cycleId, this.actor(by), slot.id, { slotVersion: slot.version, spareSlotId: spare.id });
  }

  async acknowledgeWeight(cycleId: number, side: string): Promise<void> {
    const slot = await this.slot(cycleId, side);
    const pilot = [...this.people.values()].find((person) => person.id === slot.pilotId)!;
    await this.readiness.acknowledgeWeight(cycleId, pilot, slot.id, {
      slotVersion: slot.version,
      grossWeightLb: slot.grossWeightLb,
    });
  }

  /** The air boss ticks every launch prerequisite still open, half a minute apart. */
  async tickPrerequisites(cycleId: number, by: string): Promise<void> {
    const { cycle } = await this.snapshot(cycleId);
    for (const [index, prerequisite] of cycle.launchPrerequisites.entries()) {
      if (prerequisite.ticked) continue;
      const { version } = await this.snapshot(cycleId);
      await this.prerequisites.set(cycleId, this.actor(by), index + 1, { basisVersion: version, ticked: true });
      this.clock.advance(30);
    }
  }

  async start(cycleId: number, by: string): Promise<void> {
    await this.cycleCommands.start(cycleId, this.actor(by), { basisVersion: (await this.snapshot(cycleId)).version });
  }

  /** The catapult officer of the aircraft's catapult takes the step. */
  async advance(cycleId: number, side: string, to: ReadinessStep | 'resume'): Promise<void> {
    const slot = await this.slot(cycleId, side);
    // The pilot agreed the planned weight on the tablet; the officer records that figure.
    const agreedWeightLb = to === 'weight_agreed' ? slot.grossWeightLb : undefined;
    // The console shows the approved setting, and the officer reads it back.
    const settingReadBack = to === 'setting_set' ? (slot.figures?.catapultSetting ?? undefined) : undefined;
    await this.readiness.advance(cycleId, this.officerOf(slot), slot.id, {
      slotVersion: slot.version,
      to,
      agreedWeightLb,
      settingReadBack,
    });
  }

  async suspend(cycleId: number, side: string, reason: string): Promise<void> {
    const slot = await this.slot(cycleId, side);
    await this.readiness.suspend(cycleId, this.officerOf(slot), slot.id, { slotVersion: slot.version, reason });
  }

  async launch(cycleId: number, side: string): Promise<void> {
    const slot = await this.slot(cycleId, side);
    await this.readiness.launch(cycleId, this.officerOf(slot), slot.id, {
      slotVersion: slot.version,
      idempotencyKey: `demo-cycle-${cycleId}-${side}`,
    });
  }

  private officerOf(slot: SlotView): AuthenticatedUser {
    const officer = [...this.people.values()].find(
      (person) => person.role === 'catapult_officer' && person.catapultId === slot.catapultId,
    );
    if (!officer) throw new Error(`No catapult officer runs the catapult of ${slot.sideNumber}`);
    return officer;
  }
}
