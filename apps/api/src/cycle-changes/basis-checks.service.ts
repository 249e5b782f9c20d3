import {
  closedCycleTakes,
  type CatapultStatus,
  type ChangeKind,
  type LineupChange,
  type LineupPatch,
} from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { laneSlots } from './lineup-snapshot.builder.js';
import type { LineupState } from './lineup-state.js';
import { LineupException } from './lineup.exception.js';
import { LineupChangesService } from './lineup-changes.service.js';

const REFRESH = 'Refresh and try again.';

/** The changes that write a catapult's status: the handler's or air boss's status, and a suspected cold shot. */
const SETS_CATAPULT_STATUS: readonly ChangeKind[] = ['catapult_status_set', 'cold_shot_suspected'];

const account = (change: LineupChange | null, what: string) =>
  change
    ? `Since you saw it, ${change.actor.name} changed ${what}: ${change.summary}. ${REFRESH}`
    : `${what} has changed since you saw it. ${REFRESH}`;

/**
 * Each command checks only its own basis (the slot, the lane, the catapult or the whole cycle as the
 * sender saw it) against the locked state, and a refusal says what changed and who changed it.
 */
@Injectable()
export class BasisChecks {
  constructor(private readonly changes: LineupChangesService) {}

  slot(state: LineupState, slotId: number): Slot {
    const slot = state.slots.find((candidate) => candidate.id === slotId);
    if (!slot) throw new LineupException('not_found', `Slot ${slotId} is not part of cycle ${state.cycle.number}.`);
    return slot;
  }

  catapult(state: LineupState, catapultId: number): Catapult {
    const catapult = state.catapults.find((candidate) => candidate.id === catapultId);
    if (!catapult) throw new LineupException('not_found', `Catapult ${catapultId} is not on this cycle's ship.`);
    return catapult;
  }

  /** Refuses a change to a closed cycle, unless `kind` is one a closed cycle takes (the respot's). */
  requireOpen(state: LineupState, kind?: ChangeKind): void {
    if (state.cycle.state === 'closed' && !(kind && closedCycleTakes(kind))) {
      throw new LineupException('cycle_closed', `Cycle ${state.cycle.number} is closed; its lineup no longer changes.`);
    }
  }

  /** The slot a command names, refused unless the caller saw its current version. */
  async seenSlot(manager: EntityManager, state: LineupState, slotId: number, seenVersion: number): Promise<Slot> {
    const slot = this.slot(state, slotId);
    await this.slotAsSeen(manager, state, slot, seenVersion);
    return slot;
  }

  async slotAsSeen(manager: EntityManager, state: LineupState, slot: Slot, seenVersion: number): Promise<void> {
    if (slot.version === seenVersion) return;
    const change = await this.latest(manager, state, (patch) =>
      (patch.slots ?? []).some((view) => view.id === slot.id),
    );
    throw new LineupException('stale_basis', account(change, slot.aircraft.sideNumber));
  }

  async laneAsSeen(
    manager: EntityManager,
    state: LineupState,
    catapult: Catapult,
    seenOrder: readonly number[],
  ): Promise<void> {
    const order = laneSlots(state, catapult.id).map((slot) => slot.id);
    if (order.length === seenOrder.length && order.every((id, index) => id === seenOrder[index])) return;
    const change = await this.latest(manager, state, (patch) =>
      (patch.lanes ?? []).some((lane) => lane.catapultId === catapult.id),
    );
    throw new LineupException('stale_basis', account(change, `the order on cat ${catapult.number}`));
  }

  async catapultAsSeen(
    manager: EntityManager,
    state: LineupState,
    catapult: Catapult,
    seen: CatapultStatus,
  ): Promise<void> {
    if (catapult.status === seen) return;
    // Every change of a lane carries its status, so only a change that sets it says who did. A status set
    // through another cycle of the ship is in none of this cycle's changes.
    const change = await this.latest(
      manager,
      state,
      (patch, kind) =>
        SETS_CATAPULT_STATUS.includes(kind) &&
        (patch.lanes ?? []).some((lane) => lane.catapultId === catapult.id && lane.status === catapult.status),
    );
    throw new LineupException(
      'stale_basis',
      change
        ? `Cat ${catapult.number} is ${catapult.status} now: ${change.actor.name} set it (${change.summary}). ${REFRESH}`
        : `Cat ${catapult.number} is ${catapult.status} now, not ${seen}. ${REFRESH}`,
    );
  }

  async cycleAsSeen(manager: EntityManager, state: LineupState, basisVersion: number): Promise<void> {
    const { cycle } = state;
    if (cycle.version === basisVersion) return;
    const latest = await this.latest(manager, state, () => true, basisVersion);
    const behind = cycle.version - basisVersion;
    throw new LineupException(
      'stale_basis',
      latest && behind > 0
        ? `Cycle ${cycle.number} has changed ${behind} time${behind === 1 ? '' : 's'} since you saw it; the latest: ${latest.summary} (${latest.actor.name}). ${REFRESH}`
        : `Cycle ${cycle.number} is at version ${cycle.version}, not ${basisVersion}. ${REFRESH}`,
    );
  }

  private latest(
    manager: EntityManager,
    state: LineupState,
    matches: (patch: LineupPatch, kind: ChangeKind) => boolean,
    after = 0,
  ) {
    return this.changes.latestMatching(manager, state.cycle.id, matches, after);
  }
}
