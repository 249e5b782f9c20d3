import type {
  ApplySuggestionRequest,
  ChangeActor,
  LineupCommandResult,
  MarkDownRequest,
  MoveSlotRequest,
  SetCatapultStatusRequest,
  SlotStatus,
} from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { isHeldSpare, laneSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { placeSlots, updateSlot } from '../cycle-changes/slot-writes.js';
import { aircraftOnCatapult, suspendOnStoppedCatapult, writeCatapultStatus } from './catapult-stop.js';
import { movePilotToSpare } from './spare-takeover.js';

const sameOrder = (a: readonly Slot[], b: readonly Slot[]) =>
  a.length === b.length && a.every((slot, i) => slot.id === b[i].id);

/** Lane slots that hold their place: launched, or already in the readiness steps. */
const heldPlaces = (lane: readonly Slot[]) => lane.filter((slot) => slot.status !== 'planned');

const CANNOT_GO_DOWN: readonly SlotStatus[] = ['launched', 'down', 'scratched'];

/** Refuses a pilot-less aircraft a place in a catapult's order: it would stop there, waiting for its pilot. */
export function requirePilot(slot: Slot, catapultNumber?: number): void {
  if (slot.pilotId !== null) return;
  const side = slot.aircraft.sideNumber;
  throw new LineupException(
    'pilot_missing',
    `${side} has no pilot; assign one before it joins ${catapultNumber === undefined ? 'a catapult' : `cat ${catapultNumber}`}.`,
  );
}

const heldSpareRefusal = (slot: Slot) =>
  new LineupException(
    'spare_held',
    `${slot.aircraft.sideNumber} is a spare held aside; call it for a down aircraft before it joins a lane.`,
  );

/** The handler's commands on a cycle's lineup. */
@Injectable()
export class LineupCommandsService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  move(cycleId: number, actor: ChangeActor, request: MoveSlotRequest): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'slot_moved', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, request.slotId);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (slot.status !== 'planned') {
        throw new LineupException(
          'slot_not_movable',
          `${side} is ${slot.status.replaceAll('_', ' ')}; only planned aircraft can be moved.`,
        );
      }
      const source =
        slot.catapultId === null ? [] : laneSlots(state, slot.catapultId).filter((other) => other.id !== slot.id);
      const command = { type: 'move', ...request };
      if (request.toCatapultId === null) {
        if (slot.catapultId === null) throw new LineupException('no_change', `${side} is already in the deck pool.`);
        await placeSlots(manager, { catapultId: slot.catapultId, slots: source }, { catapultId: null, slots: [slot] });
        return { summary: `${side} moved to the deck pool`, command, mirrored: true };
      }

      const catapult = this.basis.catapult(state, request.toCatapultId);
      if (isHeldSpare(state, slot)) throw heldSpareRefusal(slot);
      if (slot.catapultId !== catapult.id) requirePilot(slot, catapult.number);
      await this.basis.laneAsSeen(manager, state, catapult, request.targetLaneOrder);
      const current = laneSlots(state, catapult.id);
      const target = current.filter((other) => other.id !== slot.id);
      const held = heldPlaces(target).length;
      if (request.toIndex < held || request.toIndex > target.length) {
        throw new LineupException(
          'invalid_lineup',
          `Place ${request.toIndex + 1} on cat ${catapult.number} is not open to ${side}: choose place ${held + 1} to ${target.length + 1}.`,
        );
      }
      target.splice(request.toIndex, 0, slot);
      if (sameOrder(target, current)) {
        throw new LineupException(
          'no_change',
          `${side} is already at place ${request.toIndex + 1} on cat ${catapult.number}.`,
        );
      }
      const left =
        slot.catapultId !== null && slot.catapultId !== catapult.id
          ? [{ catapultId: slot.catapultId, slots: source }]
          : [];
      await placeSlots(manager, ...left, { catapultId: catapult.id, slots: target });
      return {
        summary: `${side} moved to cat ${catapult.number}, place ${request.toIndex + 1}`,
        command,
        mirrored: true,
      };
    });
  }

  applySuggestion(cycleId: number, actor: ChangeActor, request: ApplySuggestionRequest): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'suggestion_applied', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const placed = this.suggestedLanes(state, request);
      const listed = new Set([...placed.values()].flat().map((slot) => slot.id));
      const pooled = state.slots.filter(
        (slot) => slot.status === 'planned' && slot.catapultId !== null && !listed.has(slot.id),
      );
      const lanes = state.catapults.map((catapult) => {
        const lane = laneSlots(state, catapult.id);
        return { catapult, lane, next: [...heldPlaces(lane), ...(placed.get(catapult.id) ?? [])] };
      });
      if (pooled.length === 0 && lanes.every(({ lane, next }) => sameOrder(next, lane))) {
        throw new LineupException('no_change', 'The lineup already is the suggested one.');
      }
      await placeSlots(
        manager,
        { catapultId: null, slots: pooled },
        ...lanes.map(({ catapult, next }) => ({ catapultId: catapult.id, slots: next })),
      );
      const counts = lanes.map(({ catapult, next }) => `cat ${catapult.number} ×${next.length}`);
      return {
        summary: `Suggested lineup applied: ${counts.join(', ')}`,
        command: { type: 'apply_suggestion', ...request },
        mirrored: true,
      };
    });
  }

  markDown(
    cycleId: number,
    actor: ChangeActor,
    slotId: number,
    request: MarkDownRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'aircraft_down', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (CANNOT_GO_DOWN.includes(slot.status)) {
        throw new LineupException('wrong_step', `${side} is ${slot.status}; it cannot be marked down.`);
      }
      const spare = request.spareSlotId === undefined ? null : this.spareFor(state, slot, request.spareSlotId);
      const { catapultId, position } = slot;
      const now = this.clock.now();
      await updateSlot(manager, slot, {
        status: 'down',
        downAt: now,
        downCatapultId: catapultId,
        statusAt: now,
        statusBy: actor,
        catapultId: null,
        position: null,
        // Down again without a spare, the one that stood in for it earlier stays recorded: that record is
        // what keeps that spare called.
        replacedBySlotId: spare?.id ?? slot.replacedBySlotId,
      });
      const command = { type: 'mark_down', slotId, ...request };
      if (catapultId === null) return { summary: `${side} down`, command, mirrored: true };
      const catapult = this.basis.catapult(state, catapultId);
      if (!spare) {
        await placeSlots(manager, { catapultId: catapult.id, slots: laneSlots(state, catapult.id) });
        return { summary: `${side} down, out of cat ${catapult.number}`, command, mirrored: true };
      }
      const pilot = await movePilotToSpare(manager, slot, spare, { catapultId, position });
      return {
        summary: `${side} down; spare ${spare.aircraft.sideNumber} takes cat ${catapult.number}, place ${(position ?? 0) + 1}${pilot ? `; ${pilot} moves to ${spare.aircraft.sideNumber}` : ''}`,
        command,
        mirrored: true,
      };
    });
  }

  setCatapultStatus(
    cycleId: number,
    actor: ChangeActor,
    catapultId: number,
    request: SetCatapultStatusRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'catapult_status_set', async (manager, state) => {
      this.basis.requireOpen(state);
      const catapult = this.basis.catapult(state, catapultId);
      await this.basis.catapultAsSeen(manager, state, catapult, request.basisStatus);
      if (request.status === catapult.status) {
        throw new LineupException('no_change', `Cat ${catapult.number} is already ${catapult.status}.`);
      }
      const onIt = request.status === 'down' ? aircraftOnCatapult(state, catapult.id) : null;
      if (onIt && !request.confirm) {
        const side = onIt.aircraft.sideNumber;
        throw new LineupException(
          'aircraft_on_catapult',
          `${side} is ${onIt.status.replaceAll('_', ' ')} on cat ${catapult.number}; marking the catapult down suspends ${side}. Confirm to go on.`,
        );
      }
      await writeCatapultStatus(manager, catapult, request.status);
      const reason = request.reason ? `: ${request.reason}` : '';
      const suspended = onIt
        ? await suspendOnStoppedCatapult(
            manager,
            state,
            catapult,
            actor,
            this.clock.now(),
            `cat ${catapult.number} down${reason}`,
          )
        : '';
      return {
        summary: `Cat ${catapult.number} ${request.status}${reason}${suspended}`,
        command: { type: 'catapult_status', catapultId, ...request },
        mirrored: true,
      };
    });
  }

  /** The planned slots of each lane as the request lists them, after checking every id. */
  private suggestedLanes(state: LineupState, request: ApplySuggestionRequest): Map<number, Slot[]> {
    const lanes = new Map<number, Slot[]>();
    const seen = new Set<number>();
    for (const lane of request.lanes) {
      const catapult = this.basis.catapult(state, lane.catapultId);
      if (lanes.has(catapult.id))
        throw new LineupException('invalid_lineup', `Cat ${catapult.number} is listed twice.`);
      lanes.set(
        catapult.id,
        lane.slotIds.map((slotId) => {
          const slot = this.basis.slot(state, slotId);
          if (seen.has(slotId))
            throw new LineupException('invalid_lineup', `${slot.aircraft.sideNumber} is listed twice.`);
          seen.add(slotId);
          if (isHeldSpare(state, slot)) throw heldSpareRefusal(slot);
          requirePilot(slot, catapult.number);
          if (slot.status !== 'planned') {
            throw new LineupException(
              'invalid_lineup',
              `${slot.aircraft.sideNumber} is ${slot.status.replaceAll('_', ' ')}; only planned aircraft can be placed.`,
            );
          }
          return slot;
        }),
      );
    }
    return lanes;
  }

  private spareFor(state: LineupState, down: Slot, spareSlotId: number): Slot {
    const spare = this.basis.slot(state, spareSlotId);
    if (down.catapultId === null) {
      throw new LineupException(
        'spare_unavailable',
        `${down.aircraft.sideNumber} is in the deck pool; there is no place for a spare to take.`,
      );
    }
    if (spare.id === down.id || spare.status !== 'planned' || spare.catapultId !== null) {
      throw new LineupException(
        'spare_unavailable',
        `${spare.aircraft.sideNumber} is not waiting in the deck pool; only a planned aircraft from the pool can stand in.`,
      );
    }
    if (down.replacedBySlotId !== null) {
      const earlier = this.basis.slot(state, down.replacedBySlotId).aircraft.sideNumber;
      const side = down.aircraft.sideNumber;
      // Recording a second would leave the first one's call unrecorded, and that spare held aside again.
      throw new LineupException(
        'spare_unavailable',
        `${earlier} already stood in for ${side}; mark ${side} down without a spare and place another aircraft from the deck pool.`,
      );
    }
    // The down aircraft's pilot walks to the spare; without one, the spare must bring its own.
    if (down.pilotId === null) requirePilot(spare);
    return spare;
  }
}
