import { LaunchMathInputError } from '../errors.js';
import { at } from '../testing/cycles.fixture.js';
import { epochMs } from '../units/units.js';
import { launchTiming, timingAgainstPlan, timingAgainstWindow } from './launch-timing.js';

// The rounding rules are the board's own (common practice, no source); each value worked by hand.
describe('launch timing', () => {
  it('is late against the window by the minutes started after its end', () => {
    // By hand: 3 min 10 s after the end is the fourth minute started: 4 min late; 10 s after: 1 min late.
    expect(timingAgainstWindow(at(1090), at(900))).toEqual({ verdict: 'late', minutes: 4 });
    expect(timingAgainstWindow(at(910), at(900))).toEqual({ verdict: 'late', minutes: 1 });
    expect(timingAgainstWindow(at(1080), at(900))).toEqual({ verdict: 'late', minutes: 3 });
  });

  it('is on time at or before the window end, with the whole minutes to spare', () => {
    // By hand: 900 - 330 = 570 s = 9.5 min: 9 whole minutes to spare.
    expect(timingAgainstWindow(at(330), at(900))).toEqual({ verdict: 'on_time', minutes: 9 });
    expect(timingAgainstWindow(at(900), at(900))).toEqual({ verdict: 'on_time', minutes: 0 });
  });

  it('is early, on time or late against the plan to the nearest minute', () => {
    // By hand: 200 s behind = 3.33 min: 3 min late; 100 s ahead = 1.67 min: 2 min early; 29 s: on time.
    expect(timingAgainstPlan(at(500), at(300))).toEqual({ verdict: 'late', minutes: 3 });
    expect(timingAgainstPlan(at(200), at(300))).toEqual({ verdict: 'early', minutes: 2 });
    expect(timingAgainstPlan(at(329), at(300))).toEqual({ verdict: 'on_time', minutes: 0 });
    expect(timingAgainstPlan(at(330), at(300))).toEqual({ verdict: 'late', minutes: 1 });
  });

  it('says nothing against a plan when there is none', () => {
    expect(launchTiming(at(1090), at(900))).toEqual({ window: { verdict: 'late', minutes: 4 }, plan: null });
    expect(launchTiming(at(500), at(900), at(300)).plan).toEqual({ verdict: 'late', minutes: 3 });
  });

  it('refuses a time that is not a number', () => {
    expect(() => timingAgainstWindow(epochMs(Number.NaN), at(900))).toThrow(LaunchMathInputError);
  });
});
