import type { LaunchFigures, LaunchGateView } from '@catline/contracts';
import { launchGates, type LaunchGate, type LaunchGateVerdict, type SoftLaunchGate } from '@catline/launch-math';
import type { Slot } from '../database/entities/slot.entity.js';
import { deckHoldOf } from './deck-holds.js';
import { windStaleAt } from './cycle.mapper.js';
import type { LineupState } from './lineup-state.js';

const kt = (value: number) => `${value.toFixed(1)} kt`;

const REVERIFY_WORDS = {
  wind: 'the wind',
  ship_speed: 'the ship’s speed',
  weight: 'the gross weight',
  launch_data: 'the launch data',
} as const;

/** The crew recorded the figure agreed with the pilot (by the tablet or by signal). */
export const weightAgreed = (slot: Slot) => slot.catapultWeightAckAt !== null && slot.agreedWeightLb !== null;

/** Why a catapult inside the landing area cannot fire now: the state, and the reason it is fouled. */
function landingAreaSentence(state: LineupState, slot: Slot): string {
  const catapult = state.catapults.find((candidate) => candidate.id === slot.catapultId);
  const { landingArea, landingAreaReason } = state.cycle;
  const why =
    landingArea === 'fouled' ? `fouled${landingAreaReason ? `: ${landingAreaReason}` : ''}` : 'recovering aircraft';
  return `Cat ${catapult?.number ?? '?'} lies in the landing area, which is ${why}; it fires when the landing area is clear.`;
}

/** A gate in a sentence for the deck crew; a gate the figures close takes the figures' own sentence. */
function sentence(gate: LaunchGate, state: LineupState, slot: Slot, figures: LaunchFigures): string {
  const side = slot.aircraft.sideNumber;
  switch (gate) {
    case 'catapult_closed':
      return landingAreaSentence(state, slot);
    case 'catapult_down':
    case 'over_max_gross_weight':
    case 'crosswind_over_limit':
    case 'outside_launch_table':
    case 'approved_setting_missing':
      return figures.reasons.find((reason) => reason.code === gate)?.message ?? `${side} is no-go.`;
    case 'cycle_not_executing':
      return `Cycle ${state.cycle.number} is ${state.cycle.state}, not executing; nothing launches.`;
    case 'deck_not_clear':
      return `The air boss has not cleared this catapult to launch: ${deckHoldOf(state.cycle, slot.catapultId)?.reason ?? 'deck not clear'}.`;
    case 'weight_not_agreed':
      return `${side} has no gross weight agreed between the pilot and the catapult crew.`;
    case 'reverify_required':
      return `Figures changed (${REVERIFY_WORDS[slot.reverifyCause ?? 'wind']}) — re-verify the setting for ${side}.`;
    case 'end_speed_below_minimum':
      return `Excess wind over deck ${kt(figures.excessWindOverDeckKt ?? 0)}: end speed and headwind are below the minimum launch airspeed.`;
    case 'end_speed_over_max': {
      const { designation, maxEndSpeedKt } = slot.aircraft.type;
      return maxEndSpeedKt === null
        ? `${designation} has no maximum end speed entered; the admin enters it on the Launch data screen.`
        : `End speed ${kt(figures.endSpeedKt)} is over the ${designation} maximum of ${kt(maxEndSpeedKt)}.`;
    }
    case 'excess_below_recommended':
      return `Excess wind over deck ${kt(figures.excessWindOverDeckKt ?? 0)} is below the recommended ${kt(figures.recommendedExcessKt ?? 0)}.`;
    case 'wind_reading_stale':
      return 'The wind reading is older than the ship allows.';
  }
}

const GATE_WORDS: Record<SoftLaunchGate, string> = {
  excess_below_recommended: 'excess wind over deck below the recommended value',
  wind_reading_stale: 'stale wind reading',
};

const RECORD_LENGTH = 200;

/** The launch record's note of the waivers a shot went under ("<gate>: <reason>; …"), null for none. */
export function waiverNote(slot: Slot, waived: readonly SoftLaunchGate[]): string | null {
  const used = (slot.waivers ?? []).filter((waiver) => waived.includes(waiver.gate));
  if (used.length === 0) return null;
  const note = used.map((waiver) => `${GATE_WORDS[waiver.gate]}: ${waiver.reason}`).join('; ');
  return note.length <= RECORD_LENGTH ? note : `${note.slice(0, RECORD_LENGTH - 1)}…`;
}

export interface SlotGates {
  verdict: LaunchGateVerdict;
  views: LaunchGateView[];
}

/** The cycle's wind reading is older than the ship profile allows at `now`. */
export const windReadingStale = (state: LineupState, now: Date): boolean =>
  now.getTime() >= windStaleAt(state.cycle.windReadAt, state.ship.profile).getTime();

/**
 * The launch gates of a slot on its catapult, from launch-math's one list: the snapshot shows them and
 * the launch command refuses on them, so the station never offers a shot the server would refuse. A
 * stale wind reading turns with the clock, not with a change: the commands judge it at their own `now`;
 * the snapshot leaves it out (null) and every station flags it from the cycle's `windStaleAt`.
 */
export function slotLaunchGates(state: LineupState, slot: Slot, figures: LaunchFigures, now: Date | null): SlotGates {
  const verdict = launchGates(
    {
      noGo: figures.reasons.map((reason) => reason.code),
      excessWindOverDeck: figures.excessWindOverDeckKt,
      endSpeed: figures.endSpeedKt,
    },
    {
      cycleExecuting: state.cycle.state === 'executing',
      deckClear: deckHoldOf(state.cycle, slot.catapultId) === undefined,
      weightAgreed: weightAgreed(slot),
      reverifyRequired: slot.reverifyCause !== null,
      windReadingStale: now !== null && windReadingStale(state, now),
      maxEndSpeed: slot.aircraft.type.maxEndSpeedKt,
      waived: (slot.waivers ?? []).map((waiver) => waiver.gate),
    },
  );
  return {
    verdict,
    views: verdict.closed.map(({ gate, soft, waived }) => ({
      gate,
      soft,
      waived,
      message: sentence(gate, state, slot, figures),
    })),
  };
}
