import type { ChangeActor, DeckPositionView, LineupCommandResult, RespotView } from '@catline/contracts';
import { respotConflicts, respotTows, towBlockers, type DeckPosition } from '@catline/launch-math';
import { Injectable } from '@nestjs/common';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import {
  deckLayout,
  deckPositionView,
  heldPositions,
  holdsPosition,
  positionExists,
} from '../cycle-changes/deck-positions.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';
import type { BuildRespotDto, RespotTowDoneDto } from './dto/respot.dto.js';
import { placeWords } from './place-words.js';

const asPosition = (view: DeckPositionView): DeckPosition => ({ kind: view.kind, id: view.name });
const asView = (position: DeckPosition): DeckPositionView => ({ kind: position.kind, name: position.id });
const done = (slot: Slot) => slot.status === 'launched' || slot.status === 'down' || slot.status === 'scratched';
const sides = (slots: readonly Slot[]) => slots.map((slot) => slot.aircraft.sideNumber).join(', ');

/**
 * The respot for the coming recovery: the handler gives target positions after the last launch, Catline
 * orders the tows (launch-math's respotTows), and the deck crew's tows are ticked off one at a time; each
 * a change through the pipeline. The recovered aircraft start the ship's next cycle on their targets.
 * A cycle closes with its last launch, so the respot lands on a closed cycle (CLOSED_CYCLE_CHANGE_KINDS).
 */
@Injectable()
export class RespotService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
  ) {}

  build(cycleId: number, actor: ChangeActor, request: BuildRespotDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'respot_built', async (manager, state) => {
      this.basis.requireOpen(state, 'respot_built');
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const pending = state.slots.filter((slot) => slot.catapultId !== null && !done(slot));
      if (pending.length > 0) {
        throw new LineupException(
          'launches_pending',
          `The respot comes after the last launch; ${sides(pending)} ${pending.length === 1 ? 'is' : 'are'} still to launch.`,
        );
      }
      const slotOf = new Map<string, Slot>();
      const onBoard = heldPositions(state);
      const targets: Record<string, DeckPosition> = {};
      const reserved: Record<string, DeckPosition> = {};
      for (const target of request.targets) {
        const slot = this.basis.slot(state, target.slotId);
        const side = slot.aircraft.sideNumber;
        if (slotOf.has(String(slot.id))) {
          throw new LineupException('invalid_respot', `${side} is given two targets; give it one.`);
        }
        slotOf.set(String(slot.id), slot);
        if (!positionExists(state.ship, target.to)) {
          throw new LineupException('unknown_position', `This ship has no ${placeWords(target.to)}.`);
        }
        if (slot.status === 'launched') reserved[String(slot.id)] = asPosition(target.to);
        else if (holdsPosition(slot)) {
          targets[String(slot.id)] = asPosition(target.to);
          // A slot sharing its spot with an earlier one is not in the deck's positions yet: it takes its own now.
          onBoard[String(slot.id)] ??= asPosition(deckPositionView(slot));
        } else {
          throw new LineupException(
            'slot_not_movable',
            `${side} is ${slot.status.replaceAll('_', ' ')}; only an aircraft on deck, below or airborne takes part in a respot.`,
          );
        }
      }
      const sideOf = (id: string) => state.slots.find((slot) => String(slot.id) === id)?.aircraft.sideNumber ?? id;
      const [conflict] = respotConflicts(onBoard, targets, reserved);
      if (conflict) {
        throw new LineupException(
          'position_occupied',
          `${conflict.aircraftIds.map(sideOf).join(' and ')} would ${conflict.aircraftIds.length === 2 ? 'both' : 'all'} end on ${placeWords(asView(conflict.position))}; give each its own.`,
        );
      }
      const plan = respotTows(deckLayout(state.ship, state.catapults), onBoard, targets, reserved);
      const [stuck] = plan.stuck;
      if (stuck) {
        throw new LineupException(
          'path_blocked',
          `${sideOf(stuck.aircraftId)} cannot reach ${placeWords(asView(targets[stuck.aircraftId]))}` +
            (stuck.mustMove.length === 0
              ? '.'
              : stuck.mustMove.length === 1
                ? ` while ${sideOf(stuck.mustMove[0])} stays where it is; give it a target too.`
                : ` while ${stuck.mustMove.map(sideOf).join(', ')} stay where they are; give them a target too.`),
        );
      }
      const respot: RespotView = {
        targets: request.targets.map((target) => ({
          slotId: target.slotId,
          to: { kind: target.to.kind, name: target.to.name },
        })),
        tows: plan.tows.map((tow) => ({
          slotId: Number(tow.aircraftId),
          from: asView(tow.from),
          to: asView(tow.to),
          doneAt: null,
        })),
      };
      await manager.update(Cycle, { id: cycleId }, { respot });
      return {
        summary: `Respot built: ${plan.tows.length} tow${plan.tows.length === 1 ? '' : 's'} for ${request.targets.length} aircraft`,
        command: { type: 'respot', ...request },
      };
    });
  }

  towDone(cycleId: number, actor: ChangeActor, step: number, request: RespotTowDoneDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'respot_tow_done', async (manager, state) => {
      this.basis.requireOpen(state, 'respot_tow_done');
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const respot = state.cycle.respot;
      const tow = respot?.tows[step - 1];
      if (!respot || !tow) throw new LineupException('not_found', `The respot has no tow ${step}.`);
      const next = respot.tows.findIndex((candidate) => candidate.doneAt === null);
      if (tow.doneAt !== null) throw new LineupException('no_change', `Tow ${step} is done already.`);
      const slot = this.basis.slot(state, tow.slotId);
      const side = slot.aircraft.sideNumber;
      if (next !== step - 1) {
        const first = respot.tows[next];
        throw new LineupException(
          'respot_out_of_order',
          `Tow ${next + 1} (${this.basis.slot(state, first.slotId).aircraft.sideNumber} to ${placeWords(first.to)}) comes first.`,
        );
      }
      const from = deckPositionView(slot);
      if (!holdsPosition(slot) || from.kind !== tow.from.kind || from.name !== tow.from.name) {
        throw new LineupException(
          'respot_out_of_date',
          `${side} is no longer on ${placeWords(tow.from)}; build the respot again from where the aircraft are now.`,
        );
      }
      const positions = { ...heldPositions(state), [String(slot.id)]: asPosition(from) };
      const blockers = towBlockers(
        deckLayout(state.ship, state.catapults),
        positions,
        String(slot.id),
        asPosition(tow.to),
      );
      const inWay = [...(blockers.occupiedBy === null ? [] : [blockers.occupiedBy]), ...blockers.mustMove];
      if (inWay.length > 0 || blockers.noRoute) {
        const sideOf = (id: string) => state.slots.find((other) => String(other.id) === id)?.aircraft.sideNumber ?? id;
        throw new LineupException(
          'path_blocked',
          `${side} cannot go to ${placeWords(tow.to)} yet: ${inWay.map(sideOf).join(', ') || 'no elevator serves that way'}.`,
        );
      }
      await updateSlot(manager, slot, { deckPositionKind: tow.to.kind, deckPositionName: tow.to.name });
      const tows = respot.tows.map((candidate, index) =>
        index === step - 1 ? { ...candidate, doneAt: new Date().toISOString() } : candidate,
      );
      await manager.update(Cycle, { id: cycleId }, { respot: { ...respot, tows } });
      return {
        summary: `Respot tow ${step} done: ${side} from ${placeWords(tow.from)} to ${placeWords(tow.to)}`,
        command: { type: 'respot_tow', step, ...request },
      };
    });
  }
}
