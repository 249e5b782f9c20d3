import { isLandingAreaInUse, type SuggestedLineup } from '@catline/contracts';
import {
  epochMs,
  seconds,
  type EpochMs,
  type LineupSuggestion,
  type Seconds,
  type SuggestionInput,
} from '@catline/launch-math';
import { Injectable } from '@nestjs/common';
import { Clock } from '../cycle-changes/clock.js';
import { clearBefore, deckLayout, taxiSeconds } from '../cycle-changes/deck-positions.js';
import {
  isHeldSpare,
  laneSlots,
  launchCatapults,
  launchPriority,
  projectLineup,
} from '../cycle-changes/lineup-snapshot.builder.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { asLaunchDataRefusal } from '../cycle-changes/lineup.exception.js';
import { SuggestionPool } from './suggestion-pool.js';

/**
 * launch-math's suggested lineup for the cycle's planned aircraft. Aircraft already launched or in the
 * readiness steps keep their places at the front of their lanes; the suggestion queues behind them.
 * The search runs on a worker thread ({@link SuggestionPool}), so the API's thread stays free.
 */
@Injectable()
export class SuggestionService {
  constructor(
    private readonly snapshots: LineupSnapshotService,
    private readonly pool: SuggestionPool,
    private readonly clock: Clock,
  ) {}

  async suggest(cycleId: number): Promise<SuggestedLineup> {
    const state = await this.snapshots.readState(cycleId);
    try {
      const suggestion = await this.pool.suggest(suggestionInput(state));
      return suggestedLineup(state, suggestion, epochMs(this.clock.now().getTime()));
    } catch (error) {
      throw asLaunchDataRefusal(error);
    }
  }
}

/**
 * The planned aircraft the suggestion may place: held spares wait until called, and an aircraft with
 * no pilot would stop its lane at the catapult, so both stay out.
 */
export const suggestable = (state: LineupState) =>
  state.slots.filter((slot) => slot.status === 'planned' && slot.pilotId !== null && !isHeldSpare(state, slot));

/** launch-math's input for the cycle's planned aircraft. */
export function suggestionInput(state: LineupState): SuggestionInput {
  const { cycle } = state;
  const planned = suggestable(state);
  const layout = deckLayout(state.ship, state.catapults);
  const taxiTimes: Record<string, Record<string, Seconds>> = {};
  for (const slot of planned) {
    taxiTimes[slot.id] = {};
    for (const catapult of state.catapults) {
      const taxi = taxiSeconds(state, layout, slot, catapult);
      if (taxi !== undefined) taxiTimes[slot.id][catapult.id] = seconds(taxi);
    }
  }
  return {
    cycleStart: epochMs(cycle.plannedLaunchAt.getTime()),
    window: { start: epochMs(cycle.windowStartAt.getTime()), end: epochMs(cycle.windowEndAt.getTime()) },
    catapults: launchCatapults(state),
    landingAreaInUse: isLandingAreaInUse(cycle.landingArea),
    pairMinimumGap: seconds(state.ship.pairGapS),
    aircraft: planned.map((slot) => ({ id: String(slot.id), priority: launchPriority(slot) })),
    taxiTimes,
    clearBefore: clearBefore(state, layout),
  };
}

/**
 * The suggestion as the API answers it, with the launch times the lineup would have once applied: for a
 * launching cycle re-based on `now`, as the board's are.
 */
export function suggestedLineup(state: LineupState, suggestion: LineupSuggestion, now?: EpochMs): SuggestedLineup {
  const { cycle } = state;
  const lanes = state.catapults.map((catapult) => ({
    catapultId: catapult.id,
    slotIds: (suggestion.lanes[catapult.id] ?? []).map(Number),
  }));
  // The lineup as applying it would leave it, so its last launch is the one the snapshot will show.
  const applied = Object.fromEntries(
    lanes.map((lane) => [
      String(lane.catapultId),
      [
        ...laneSlots(state, lane.catapultId)
          .filter((slot) => slot.status !== 'planned')
          .map((slot) => slot.id),
        ...lane.slotIds,
      ].map(String),
    ]),
  );
  const projection = projectLineup(state, applied, now);
  return {
    basisVersion: cycle.version,
    lanes,
    unassigned: state.slots
      .filter((slot) => slot.status === 'planned' && slot.pilotId === null && !isHeldSpare(state, slot))
      .map((slot) => slot.id),
    lastLaunchAt: projection.lastLaunch === null ? null : new Date(projection.lastLaunch).toISOString(),
    projected: projection.slots
      .filter((slot) => !slot.launched)
      .map((slot) => ({
        slotId: Number(slot.slotId),
        catapultId: Number(slot.catapultId),
        launchAt: new Date(slot.time).toISOString(),
        missesWindow: slot.missesWindow,
      })),
  };
}
