import { knots } from '../units/units.js';
import {
  HARD_LAUNCH_GATES,
  LAUNCH_GATES,
  SOFT_LAUNCH_GATES,
  launchGates,
  type LaunchGateFacts,
} from './launch-gates.js';

// Which limits are hard and which soft is Catline's product rule (product brief § Computation 4):
// weight, crosswind, end speed below minimum or above the type's maximum, catapult down, deck not clear
// refuse with no override; excess under the recommended value and a stale wind reading take a waiver.
// The figures below are written by hand; launch-figures.spec.ts checks how launchFigures reaches them.

const ready: LaunchGateFacts = {
  cycleExecuting: true,
  deckClear: true,
  weightAgreed: true,
  reverifyRequired: false,
  windReadingStale: false,
  maxEndSpeed: 180,
  waived: [],
};
const goFigures = { noGo: [], excessWindOverDeck: knots(20), endSpeed: knots(150) };

describe('launchGates', () => {
  it('clears a go aircraft with every fact in order', () => {
    expect(launchGates(goFigures, ready)).toEqual({ closed: [], refusals: [], cleared: true, waivedGates: [] });
  });

  it('lists hard gates before soft ones and every gate once', () => {
    expect(LAUNCH_GATES).toEqual([...HARD_LAUNCH_GATES, ...SOFT_LAUNCH_GATES]);
    expect(new Set(LAUNCH_GATES).size).toBe(LAUNCH_GATES.length);
  });

  it('treats excess at 3 kt under a 5 kt recommendation as soft, and a waiver clears it', () => {
    // Headwind 20 kt, end speed 123 kt, minimum launch airspeed 140 kt: excess 20 - (140 - 123) = 3 kt.
    const figures = { noGo: ['margin_negative'] as const, excessWindOverDeck: knots(3), endSpeed: knots(123) };
    expect(launchGates(figures, ready)).toMatchObject({ refusals: ['excess_below_recommended'], cleared: false });
    expect(launchGates(figures, { ...ready, waived: ['excess_below_recommended'] })).toEqual({
      closed: [{ gate: 'excess_below_recommended', soft: true, waived: true }],
      refusals: [],
      cleared: true,
      waivedGates: ['excess_below_recommended'],
    });
  });

  it('treats excess below zero as the hard end-speed minimum, which no waiver clears', () => {
    // Headwind 10 kt, end speed 123 kt, minimum 140 kt: excess 10 - 17 = -7 kt.
    const figures = { noGo: ['margin_negative'] as const, excessWindOverDeck: knots(-7), endSpeed: knots(123) };
    const verdict = launchGates(figures, { ...ready, waived: ['excess_below_recommended'] });
    expect(verdict.refusals).toEqual(['end_speed_below_minimum']);
    expect(verdict.cleared).toBe(false);
  });

  it("refuses an end speed over the type's maximum (overstress)", () => {
    expect(launchGates({ ...goFigures, endSpeed: knots(180.5) }, ready).refusals).toEqual(['end_speed_over_max']);
    expect(launchGates({ ...goFigures, endSpeed: knots(180) }, ready).cleared).toBe(true);
    // A type without its maximum entered: no shot is known safe, so none is offered (common practice, no source).
    expect(launchGates(goFigures, { ...ready, maxEndSpeed: null }).refusals).toEqual(['end_speed_over_max']);
  });

  it('passes the figures’ own hard limits through with their codes', () => {
    const noGo = ['catapult_down', 'over_max_gross_weight', 'crosswind_over_limit'] as const;
    expect(launchGates({ ...goFigures, noGo }, ready).refusals).toEqual([
      'catapult_down',
      'over_max_gross_weight',
      'crosswind_over_limit',
    ]);
  });

  it('refuses on the facts of the moment: cycle, deck, weight, re-verify, stale wind', () => {
    const verdict = launchGates(goFigures, {
      ...ready,
      cycleExecuting: false,
      deckClear: false,
      weightAgreed: false,
      reverifyRequired: true,
      windReadingStale: true,
      waived: ['wind_reading_stale'],
    });
    expect(verdict.refusals).toEqual([
      'cycle_not_executing',
      'deck_not_clear',
      'weight_not_agreed',
      'reverify_required',
    ]);
    expect(verdict.waivedGates).toEqual(['wind_reading_stale']);
  });

  it('ignores a waiver for a gate that is open', () => {
    expect(launchGates(goFigures, { ...ready, waived: ['wind_reading_stale'] }).waivedGates).toEqual([]);
  });
});
