import type { LaunchNoGoCode } from './launch-figures.js';

/**
 * Everything that must hold before a catapult fires, as one list. A hard gate refuses the shot and
 * nothing overrides it; a soft gate refuses it until the air boss waives it with a reason. A new
 * limit (another area's "deck not clear", "landing area not clear") is one more entry here.
 */
export const HARD_LAUNCH_GATES = [
  'cycle_not_executing',
  'catapult_down',
  /** A catapult inside the landing area (the waist ones by default) while it recovers or is fouled. */
  'catapult_closed',
  /** The air boss has not cleared the deck ahead of this catapult. */
  'deck_not_clear',
  'weight_not_agreed',
  /** Wind, ship speed, weight or launch data changed after the setting was read back. */
  'reverify_required',
  'over_max_gross_weight',
  'crosswind_over_limit',
  'outside_launch_table',
  /** The ship's approved data gives no setting for this catapult, type, configuration and weight. */
  'approved_setting_missing',
  /** End speed plus headwind below the minimum launch airspeed: the excess wind over deck is below zero. */
  'end_speed_below_minimum',
  /** The setting gives more end speed than the type may take (overstress). */
  'end_speed_over_max',
] as const;
export type HardLaunchGate = (typeof HARD_LAUNCH_GATES)[number];

export const SOFT_LAUNCH_GATES = [
  /** Excess wind over deck at or above zero but below the type's recommended excess. */
  'excess_below_recommended',
  /** The wind reading the figures rest on is older than the ship allows. */
  'wind_reading_stale',
] as const;
export type SoftLaunchGate = (typeof SOFT_LAUNCH_GATES)[number];

export type LaunchGate = HardLaunchGate | SoftLaunchGate;

/** Every gate in the order the launch command reports them: hard ones first. */
export const LAUNCH_GATES: readonly LaunchGate[] = [...HARD_LAUNCH_GATES, ...SOFT_LAUNCH_GATES];

export const isSoftLaunchGate = (gate: string): gate is SoftLaunchGate =>
  (SOFT_LAUNCH_GATES as readonly string[]).includes(gate);

/** The facts of the moment that are not launch figures. */
export interface LaunchGateFacts {
  readonly cycleExecuting: boolean;
  /** Cleared by the air boss for this catapult; true where the ship does not track it. */
  readonly deckClear: boolean;
  /** The pilot and the catapult crew agree on the gross weight the figures use. */
  readonly weightAgreed: boolean;
  /** Figures changed after the setting was read back and nobody has read the new one back. */
  readonly reverifyRequired: boolean;
  readonly windReadingStale: boolean;
  /** The type's maximum end speed (overstress), knots; null when not entered: no shot is known safe. */
  readonly maxEndSpeed: number | null;
  /** Soft gates the air boss has waived for this aircraft. */
  readonly waived: readonly SoftLaunchGate[];
}

export interface ClosedGate {
  readonly gate: LaunchGate;
  readonly soft: boolean;
  /** A soft gate the air boss waived; it no longer refuses the shot. */
  readonly waived: boolean;
}

export interface LaunchGateVerdict {
  /** Every gate that is closed, in `LAUNCH_GATES` order, waived ones included. */
  readonly closed: readonly ClosedGate[];
  /** The gates that refuse the shot now: every hard one, and soft ones not waived. */
  readonly refusals: readonly LaunchGate[];
  readonly cleared: boolean;
  /** Soft gates closed and waived: the launch goes on the record as under a waiver. */
  readonly waivedGates: readonly SoftLaunchGate[];
}

/** What the gates need of `launchFigures`' answer, knots. */
export interface LaunchGateFigures {
  /** The codes of its no-go reasons. */
  readonly noGo: readonly LaunchNoGoCode[];
  readonly excessWindOverDeck: number | null;
  readonly endSpeed: number;
}

/** Which gates the figures close, from launchFigures' own verdict. */
function closedByFigures(figures: LaunchGateFigures, maxEndSpeed: number | null): Set<LaunchGate> {
  const closed = new Set<LaunchGate>();
  for (const code of figures.noGo) {
    switch (code) {
      case 'catapult_down':
      case 'catapult_closed':
      case 'over_max_gross_weight':
      case 'crosswind_over_limit':
      case 'outside_launch_table':
      case 'approved_setting_missing':
        closed.add(code);
        break;
      // Short of the wanted end speed or of the recommended excess: how far short decides hard or soft.
      case 'setting_out_of_range':
      case 'margin_negative':
        closed.add(
          figures.excessWindOverDeck !== null && figures.excessWindOverDeck < 0
            ? 'end_speed_below_minimum'
            : 'excess_below_recommended',
        );
        break;
    }
  }
  if (figures.excessWindOverDeck !== null && figures.excessWindOverDeck < 0) closed.add('end_speed_below_minimum');
  if (maxEndSpeed === null || figures.endSpeed > maxEndSpeed) closed.add('end_speed_over_max');
  return closed;
}

/**
 * The launch gates of one aircraft on its catapult: which are closed, which of those refuse the shot,
 * and whether it may be fired. Pure; the launch command calls it and refuses with the first refusal.
 */
export function launchGates(figures: LaunchGateFigures, facts: LaunchGateFacts): LaunchGateVerdict {
  const closed = closedByFigures(figures, facts.maxEndSpeed);
  if (!facts.cycleExecuting) closed.add('cycle_not_executing');
  if (!facts.deckClear) closed.add('deck_not_clear');
  if (!facts.weightAgreed) closed.add('weight_not_agreed');
  if (facts.reverifyRequired) closed.add('reverify_required');
  if (facts.windReadingStale) closed.add('wind_reading_stale');

  const gates = LAUNCH_GATES.filter((gate) => closed.has(gate)).map((gate) => {
    const soft = isSoftLaunchGate(gate);
    return { gate, soft, waived: soft && facts.waived.includes(gate) };
  });
  const refusals = gates.filter((gate) => !gate.waived).map((gate) => gate.gate);
  return {
    closed: gates,
    refusals,
    cleared: refusals.length === 0,
    waivedGates: gates.filter((gate) => gate.waived).map((gate) => gate.gate as SoftLaunchGate),
  };
}
