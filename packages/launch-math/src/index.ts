export { LaunchMathInputError } from './errors.js';
export * from './units/units.js';
export * from './units/angles.js';
export * from './wind/wind-over-deck.js';
export * from './wind/wind-reading.js';
export * from './atmosphere/isa.js';
export * from './catapult/end-speed.js';
export * from './aircraft/aircraft-profile.js';
export * from './aircraft/gross-weight.js';
export * from './launch/launch-airspeed.js';
export * from './launch/launch-settings.js';
export * from './launch/approved-setting.js';
export * from './launch/launch-figures.js';
export * from './deck/deck-positions.js';
export * from './deck/deck-layout-problems.js';
export * from './deck/respot.js';
export {
  catapultClosedReason,
  clearingTiers,
  inLandingArea,
  projectLaunchTimes,
  type LaunchCatapult,
  type LaunchPriority,
  type LaunchWindow,
  type ProjectedSlot,
  type Projection,
  type ProjectionInput,
  type UnschedulableReason,
  type UnschedulableSlot,
} from './schedule/launch-projection.js';
export * from './schedule/lineup-suggestion.js';
export * from './schedule/launch-readiness.js';
export * from './schedule/launch-timing.js';
export * from './after-shot/weather-case.js';
export * from './after-shot/after-shot.js';
export * from './after-shot/night.js';
export * from './launch/launch-gates.js';
export * from './readiness/reverify.js';
export * from './readiness/readiness-steps.js';
export * from './readiness/readiness-machine.js';
