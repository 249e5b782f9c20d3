import type { AssignPilotRequest, ChangeActor, LineupCommandResult } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { User } from '../database/entities/user.entity.js';

/** A pilot's aircraft may change hands only before it starts to taxi (or while it is down). */
const pilotCanChange = (slot: Slot) => slot.status === 'planned' || slot.status === 'down';

/** An aircraft in a catapult's order keeps its pilot: without one it would stop there, waiting (see requirePilot). */
function requireOutOfLane(state: LineupState, slot: Slot): void {
  if (slot.catapultId === null) return;
  const catapult = state.catapults.find((candidate) => candidate.id === slot.catapultId);
  const side = slot.aircraft.sideNumber;
  throw new LineupException(
    'pilot_missing',
    `${side} is in the order of cat ${catapult?.number ?? slot.catapultId}; move it to the deck pool before its pilot leaves it.`,
  );
}

const NO_ACKNOWLEDGEMENT = { pilotWeightAckAt: null, pilotWeightAckLb: null };

/** The handler's and air operations' assignment of pilots to the cycle's aircraft. */
@Injectable()
export class PilotAssignmentService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
  ) {}

  /**
   * Gives the aircraft a pilot, or takes its pilot off (null). A pilot who flies another aircraft of the
   * cycle moves from it in the same change. A new pilot has not acknowledged the weight yet.
   */
  assign(
    cycleId: number,
    actor: ChangeActor,
    slotId: number,
    request: AssignPilotRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'pilot_assigned', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (!pilotCanChange(slot)) {
        throw new LineupException(
          'wrong_step',
          `${side} is ${slot.status.replaceAll('_', ' ')}; its pilot can change only while it is planned or down.`,
        );
      }
      if (request.pilotId === slot.pilotId) {
        throw new LineupException('no_change', `${side} already has ${slot.pilot?.name ?? 'no pilot'}.`);
      }
      const command = { type: 'assign_pilot', slotId, ...request };
      if (request.pilotId === null) {
        requireOutOfLane(state, slot);
        const name = slot.pilot?.name ?? 'the pilot';
        await updateSlot(manager, slot, { pilotId: null, ...NO_ACKNOWLEDGEMENT });
        slot.pilot = null;
        return { summary: `${name} taken off ${side}; ${side} has no pilot`, command, mirrored: true };
      }
      const pilot = await this.activePilot(manager, state.cycle.shipId, request.pilotId);
      const from = this.currentAircraft(state, pilot, slot);
      if (from) {
        requireOutOfLane(state, from);
        await updateSlot(manager, from, { pilotId: null, ...NO_ACKNOWLEDGEMENT });
        from.pilot = null;
      }
      await updateSlot(manager, slot, { pilotId: pilot.id, ...NO_ACKNOWLEDGEMENT });
      slot.pilot = pilot;
      return {
        summary: from
          ? `${pilot.name} moves from ${from.aircraft.sideNumber} to ${side}`
          : `${pilot.name} assigned to ${side}`,
        command,
        mirrored: true,
      };
    });
  }

  /** A pilot of the cycle's ship: one of another ship is refused as a person who is not a pilot. */
  private async activePilot(manager: EntityManager, shipId: number, pilotId: number): Promise<User> {
    const pilot = await manager.findOne(User, {
      where: { id: pilotId, shipId },
      select: { id: true, name: true, role: true, active: true },
    });
    if (!pilot || pilot.role !== 'pilot' || !pilot.active) {
      throw new LineupException('invalid_pilot', `Person ${pilotId} is not an active pilot.`);
    }
    return pilot;
  }

  /** The aircraft of the cycle the pilot flies now, if any; refused when it has already started or flown. */
  private currentAircraft(state: LineupState, pilot: User, target: Slot): Slot | null {
    const flying = state.slots.find((other) => other.id !== target.id && other.pilotId === pilot.id);
    if (!flying || flying.status === 'scratched') return null;
    if (!pilotCanChange(flying)) {
      throw new LineupException(
        'invalid_pilot',
        `${pilot.name} flies ${flying.aircraft.sideNumber}, which is ${flying.status.replaceAll('_', ' ')}; they cannot move.`,
      );
    }
    return flying;
  }
}
