import type { CycleView } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';

const conditionsOf = (view: CycleView): Partial<Cycle> => ({
  plannedLaunchAt: new Date(view.plannedLaunchAt),
  windowStartAt: new Date(view.windowStartAt),
  windowEndAt: new Date(view.windowEndAt),
  shipCourseDeg: view.shipCourseDeg,
  shipSpeedKt: view.shipSpeedKt,
  trueWindFromDeg: view.trueWindFromDeg,
  trueWindSpeedKt: view.trueWindSpeedKt,
  temperatureC: view.temperatureC,
  pressureHpa: view.pressureHpa,
  weatherCase: view.weatherCase,
  night: view.night,
  landingArea: view.landingArea,
  landingAreaReason: view.landingAreaReason,
});

/**
 * The cycle as it stood at version 0, just created: no aircraft (each one enters through a logged
 * change), planning, under the conditions the log first records (every change carries the cycle view,
 * so the first change's view holds them). The ship and its catapults are taken as they are now: the
 * log records a catapult's status only when a change of this cycle touched it.
 */
export function versionZeroState(state: LineupState, firstRecordedCycle: CycleView | undefined): LineupState {
  const cycle: Cycle = {
    ...state.cycle,
    ...(firstRecordedCycle ? conditionsOf(firstRecordedCycle) : {}),
    state: 'planning',
    // Each tick entered through a logged change.
    prerequisiteTicks: null,
    version: 0,
  };
  return { ...state, cycle, slots: [] };
}
