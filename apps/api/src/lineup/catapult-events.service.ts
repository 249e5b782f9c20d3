import {
  shipClock,
  shipTimeZone,
  type CatapultEventRequest,
  type DownOnCatapultRequest,
  type LineupCommandResult,
  type SlotStatus,
} from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { laneSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { placeSlots, updateSlot } from '../cycle-changes/slot-writes.js';
import { suspendOnStoppedCatapult, writeCatapultStatus } from './catapult-stop.js';
import { transition } from './readiness-facts.js';
import { statusWords } from '../common/wording.js';

/**
 * What goes wrong at the catapult, each an event of its own in the change log (who and when):
 * a hangfire, a suspected cold shot, an aircraft going unserviceable on the catapult.
 */
@Injectable()
export class CatapultEventsService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  /** The catapult fired and the aircraft did not go: it stays where it is, suspended. */
  hangfire(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: CatapultEventRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'hangfire', async (manager, state) => {
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      transition(
        state,
        slot,
        user,
        { kind: 'hangfire' },
        'hangfire',
        `${side} is ${statusWords(slot.status)}; a hangfire is reported only once it is tensioned.`,
      );
      const now = this.clock.now();
      await updateSlot(manager, slot, {
        status: 'suspended',
        suspendedAt: now,
        suspendReason: 'hangfire',
        statusAt: now,
        statusBy: user,
        lastStep: null,
      });
      const catapult = this.basis.catapult(state, slot.catapultId!);
      return {
        summary: `Hangfire: cat ${catapult.number} fired and ${side} did not go; ${side} suspended`,
        command: { type: 'hangfire', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /**
   * The aircraft just launched went on a shot the crew suspect was cold: the catapult goes down for
   * inspection, and an aircraft already on it is suspended.
   */
  coldShot(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: CatapultEventRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'cold_shot_suspected', async (manager, state) => {
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      transition(
        state,
        slot,
        user,
        { kind: 'cold_shot' },
        'cold shot',
        `${side} is ${statusWords(slot.status)}; a suspected cold shot is reported on an aircraft that launched.`,
      );
      const catapult = this.basis.catapult(state, slot.catapultId!);
      const last = laneSlots(state, catapult.id)
        .filter((other) => other.launchedAt !== null)
        .sort((a, b) => b.launchedAt!.getTime() - a.launchedAt!.getTime())[0];
      if (last.id !== slot.id) {
        throw new LineupException(
          'wrong_step',
          `${last.aircraft.sideNumber} launched from cat ${catapult.number} after ${side}; report a cold shot on the last shot.`,
        );
      }
      const now = this.clock.now();
      let stopped = `; cat ${catapult.number} was already down`;
      if (catapult.status === 'up') {
        await writeCatapultStatus(manager, catapult, 'down');
        stopped = `; cat ${catapult.number} down for inspection`;
      }
      const suspended = await suspendOnStoppedCatapult(manager, state, catapult, user, now, 'suspected cold shot');
      return {
        summary: `Suspected cold shot: ${side} from cat ${catapult.number} (launched ${shipClock(slot.launchedAt!, shipTimeZone(state.ship.profile))})${stopped}${suspended}`,
        command: { type: 'cold_shot', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** The aircraft went unserviceable on the catapult: back to the deck pool to be fixed, or down. */
  downOnCatapult(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: DownOnCatapultRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'down_on_catapult', async (manager, state) => {
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      const next = transition(
        state,
        slot,
        user,
        { kind: 'down_on_catapult', outcome: request.outcome },
        'down on catapult',
        `${side} is ${statusWords(slot.status)}; only an aircraft on the catapult or suspended there goes down on it.`,
      );
      const catapult = this.basis.catapult(state, slot.catapultId!);
      const now = this.clock.now();
      const lane = laneSlots(state, catapult.id).filter((other) => other.id !== slot.id);
      await updateSlot(manager, slot, {
        status: next.status as SlotStatus,
        statusAt: now,
        statusBy: user,
        taxiingAt: null,
        onCatapultAt: null,
        tensionedAt: null,
        agreedWeightLb: null,
        catapultWeightAckAt: null,
        weightAgreedBy: null,
        settingReadBack: null,
        reverifyCause: null,
        lastStep: null,
        suspendReason: null,
        ...(request.outcome === 'down' ? { downAt: now, downCatapultId: catapult.id } : {}),
      });
      await placeSlots(manager, { catapultId: catapult.id, slots: lane }, { catapultId: null, slots: [slot] });
      const where = request.outcome === 'down' ? 'down, out of the cycle' : 'back to the deck pool';
      return {
        summary: `${side} unserviceable on cat ${catapult.number}: ${where}`,
        command: { type: 'down_on_catapult', slotId, ...request },
        mirrored: true,
      };
    });
  }
}
