import type { LaunchFigures, NoGoReason } from '@catline/contracts';
import {
  assessLaunch,
  knots,
  launchEndSpeed,
  lowestLaunchSetting,
  minimumLaunchAirspeed,
  pounds,
  requiredWindOverDeck,
  type AircraftProfile,
  type Knots,
  type NoGoReason as MathNoGoReason,
  type UnschedulableReason,
  type WindComponents,
} from '@catline/launch-math';
import type { AircraftType } from '../aircraft-types/entities/aircraft-type.entity.js';
import type { Catapult } from '../ships/entities/catapult.entity.js';
import { aircraftProfile, catapultEnergy } from './launch-math.adapter.js';

export interface FiguresInput {
  type: AircraftType;
  grossWeightLb: number;
  catapult: Catapult;
  wind: WindComponents;
  /** Why the catapult cannot launch now (down, or a waist catapult while the landing area is in use). */
  closedReason: UnschedulableReason | null;
  densityRatio: number;
  clearingTurnDeg: number;
}

const kt = (value: number) => `${value.toFixed(1)} kt`;
const lb = (value: number) => `${Math.round(value).toLocaleString('en-US')} lb`;

function describe(reason: MathNoGoReason, input: FiguresInput): NoGoReason {
  const designation = input.type.designation;
  switch (reason.code) {
    case 'margin_negative':
      return {
        code: reason.code,
        message: `Launch margin ${kt(reason.margin)}: headwind ${kt(reason.headwind)} is below the ${kt(reason.requiredWindOverDeck)} wind over deck required.`,
      };
    case 'crosswind_over_limit':
      return {
        code: reason.code,
        message: `Crosswind ${kt(reason.crosswind)} from ${reason.side} is over the ${designation} limit of ${kt(reason.limit)}.`,
      };
    case 'over_max_gross_weight':
      return {
        code: reason.code,
        message: `Gross weight ${lb(reason.grossWeight)} is over the ${designation} maximum of ${lb(reason.maxGrossWeight)}.`,
      };
    case 'catapult_down':
      return { code: reason.code, message: `Cat ${input.catapult.number} is down.` };
    case 'outside_launch_table':
      return {
        code: reason.code,
        message: `Gross weight ${lb(reason.grossWeight)} is outside the ${designation} launch data (${lb(reason.lowest)} to ${lb(reason.highest)}).`,
      };
  }
}

// launch-math has no named function for these two; its required wind over deck (airspeed + excess -
// end speed) gives both: with no end speed it is the required airspeed, with the headwind in place of
// the end speed it is the end speed the catapult must deliver.
const requiredAirspeedOf = (profile: AircraftProfile, minimum: Knots): Knots =>
  requiredWindOverDeck({ minimumLaunchAirspeed: minimum, requiredExcess: profile.requiredExcess, endSpeed: knots(0) });
const wantedEndSpeed = (requiredAirspeed: Knots, headwind: Knots): Knots =>
  knots(Math.max(0, requiredWindOverDeck({ minimumLaunchAirspeed: requiredAirspeed, requiredExcess: knots(0), endSpeed: headwind })));

/**
 * One aircraft's figures on one catapult, all from @catline/launch-math: the wanted end speed is the
 * required airspeed less the headwind; the lowest setting reaching it gives the end speed the margin
 * and go/no-go are judged on (the highest setting when none reaches it).
 */
export function launchFigures(input: FiguresInput): LaunchFigures {
  const profile: AircraftProfile = aircraftProfile(input.type);
  const grossWeight = pounds(input.grossWeightLb);
  const catapult = catapultEnergy(input.catapult);
  const minimum = minimumLaunchAirspeed(profile, grossWeight, input.densityRatio);
  const requiredAirspeed = minimum.kind === 'airspeed' ? requiredAirspeedOf(profile, minimum.airspeed) : null;
  const wanted = requiredAirspeed === null ? null : wantedEndSpeed(requiredAirspeed, input.wind.headwind);
  const setting = wanted === null ? null : lowestLaunchSetting({ aircraft: profile, catapult, grossWeight, wanted });
  const endSpeed =
    setting?.kind === 'setting'
      ? setting.endSpeed
      : launchEndSpeed({ aircraft: profile, catapult, setting: catapult.maxSetting, grossWeight });
  const assessment = assessLaunch({
    aircraft: profile,
    grossWeight,
    endSpeed,
    wind: input.wind,
    catapultUp: input.catapult.status === 'up',
    densityRatio: input.densityRatio,
  });

  const reasons = assessment.reasons.map((reason) => describe(reason, input));
  if (input.closedReason === 'waist_closed') {
    reasons.push({ code: 'catapult_closed', message: `Cat ${input.catapult.number} is closed while the landing area is in use.` });
  }
  if (setting?.kind === 'out_of_range') {
    reasons.push({
      code: 'setting_out_of_range',
      message: `The highest setting of cat ${input.catapult.number} gives ${kt(setting.maxEndSpeed)} end speed; ${kt(wanted ?? 0)} is wanted.`,
    });
  }
  return {
    headwindKt: input.wind.headwind,
    crosswindKt: input.wind.crosswind,
    crosswindSide: input.wind.side,
    catapultSetting: setting?.kind === 'setting' ? setting.setting : null,
    endSpeedKt: endSpeed,
    requiredAirspeedKt: requiredAirspeed,
    requiredWindOverDeckKt: assessment.requiredWindOverDeck,
    marginKt: assessment.margin,
    go: reasons.length === 0,
    reasons,
    clearingTurnDeg: input.clearingTurnDeg,
  };
}
