import type { ChangeActor, DeckPositionView, LineupCommandResult } from '@catline/contracts';
import { towBlockers } from '@catline/launch-math';
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
import { deckHoldOf } from '../cycle-changes/deck-holds.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import type { SetDeckStatusDto } from './dto/set-deck-status.dto.js';
import type { SetLandingAreaDto } from './dto/set-landing-area.dto.js';
import type { TowAircraftDto } from './dto/tow-aircraft.dto.js';
import { placeWords } from './place-words.js';

/** The deck's commands: tows between positions and the landing area's state, each a versioned change. */
@Injectable()
export class DeckCommandsService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
  ) {}

  tow(cycleId: number, actor: ChangeActor, request: TowAircraftDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'aircraft_towed', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, request.slotId);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      const to: DeckPositionView = { kind: request.to.kind, name: request.to.name };
      if (!holdsPosition(slot)) {
        throw new LineupException(
          'slot_not_movable',
          `${side} is ${slot.status.replaceAll('_', ' ')}; only an aircraft on its position can be towed.`,
        );
      }
      if (!positionExists(state.ship, to)) {
        throw new LineupException('unknown_position', `This ship has no ${placeWords(to)}.`);
      }
      const from = deckPositionView(slot);
      if (from.kind === to.kind && from.name === to.name) {
        throw new LineupException('no_change', `${side} is already on ${placeWords(to)}.`);
      }
      // A slot sharing its spot with an earlier one is not in the deck's positions yet: it takes its own now.
      const positions = { ...heldPositions(state), [String(slot.id)]: { kind: from.kind, id: from.name } };
      const blockers = towBlockers(deckLayout(state.ship, state.catapults), positions, String(slot.id), {
        kind: to.kind,
        id: to.name,
      });
      const sideOf = (id: string) => state.slots.find((other) => String(other.id) === id)?.aircraft.sideNumber ?? id;
      if (blockers.occupiedBy !== null) {
        throw new LineupException(
          'position_occupied',
          `${placeWords(to)} is held by ${sideOf(blockers.occupiedBy)}; tow it away first.`,
        );
      }
      if (blockers.noRoute) {
        throw new LineupException(
          'path_blocked',
          `${side} cannot go from ${placeWords(from)} to ${placeWords(to)}: no elevator serves that way.`,
        );
      }
      if (blockers.mustMove.length > 0) {
        throw new LineupException(
          'path_blocked',
          `${side} cannot be towed from ${placeWords(from)} to ${placeWords(to)} until ${blockers.mustMove.map(sideOf).join(', ')} ${blockers.mustMove.length === 1 ? 'moves' : 'move'}.`,
        );
      }
      await updateSlot(manager, slot, { deckPositionKind: to.kind, deckPositionName: to.name });
      return {
        summary: `${side} towed from ${placeWords(from)} to ${placeWords(to)}`,
        command: { type: 'tow', ...request, to },
        mirrored: true,
      };
    });
  }

  setLandingArea(cycleId: number, actor: ChangeActor, request: SetLandingAreaDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'landing_area_set', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const reason = request.state === 'clear' ? null : (request.reason ?? null);
      const { cycle } = state;
      if (cycle.landingArea === request.state && cycle.landingAreaReason === reason) {
        throw new LineupException('no_change', `The landing area already is ${request.state}.`);
      }
      await manager.update(Cycle, { id: cycleId }, { landingArea: request.state, landingAreaReason: reason });
      return {
        summary: `Landing area ${request.state}${reason ? `: ${reason}` : ''}`,
        command: { type: 'landing_area', ...request },
      };
    });
  }

  /** The air boss clears a catapult to launch, or holds it with a reason; a held catapult launches nothing. */
  setDeckStatus(cycleId: number, actor: ChangeActor, request: SetDeckStatusDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'deck_status_set', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const catapult = state.catapults.find((candidate) => candidate.id === request.catapultId);
      if (!catapult) {
        throw new LineupException('not_found', `Catapult ${request.catapultId} is not a catapult of this ship.`);
      }
      const reason = request.clear ? null : request.reason!;
      const held = deckHoldOf(state.cycle, catapult.id);
      if ((held?.reason ?? null) === reason) {
        throw new LineupException('no_change', `Cat ${catapult.number} already is ${reason ? 'held' : 'clear'}.`);
      }
      const others = (state.cycle.deckHolds ?? []).filter((hold) => hold.catapultId !== catapult.id);
      const deckHolds = reason === null ? others : [...others, { catapultId: catapult.id, reason }];
      await manager.update(Cycle, { id: cycleId }, { deckHolds });
      return {
        summary: `Cat ${catapult.number} ${reason === null ? 'clear to launch' : `not clear: ${reason}`}`,
        command: { type: 'deck_status', ...request },
      };
    });
  }
}
