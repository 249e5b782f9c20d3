import {
  DEFAULT_SETTING_CROSS_CHECK_TOLERANCE,
  type LaunchConfiguration,
  type LaunchFigures,
  type NoGoReason,
} from '@catline/contracts';
import {
  launchFigures,
  pounds,
  type LaunchNoGoReason,
  type UnschedulableReason,
  type WindComponents,
} from '@catline/launch-math';
import type { AircraftType } from '../database/entities/aircraft-type.entity.js';
import type { Catapult } from '../database/entities/catapult.entity.js';
import { aircraftProfile, approvedSettingTable, catapultEnergy } from './launch-math.adapter.js';

export interface FiguresInput {
  type: AircraftType;
  grossWeightLb: number;
  catapult: Catapult;
  wind: WindComponents;
  /** Why the catapult cannot launch now (down, or a waist catapult while the landing area is in use). */
  closedReason: UnschedulableReason | null;
  densityRatio: number;
  clearingTurnDeg: number;
  /** Which of the type's approved setting tables the aircraft launches on. */
  configuration: LaunchConfiguration;
  /** The ship profile's settingCrossCheckTolerance; left out, the default. */
  crossCheckTolerance: number | undefined;
}

const kt = (value: number) => `${value.toFixed(1)} kt`;
const lb = (value: number) => `${Math.round(value).toLocaleString('en-US')} lb`;

/** launch-math's reason in a sentence for the deck crew; the code passes through unchanged. */
function describe(reason: LaunchNoGoReason, input: FiguresInput): NoGoReason {
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
    case 'catapult_closed':
      return { code: reason.code, message: `Cat ${input.catapult.number} is closed while the landing area is in use.` };
    case 'outside_launch_table':
      return {
        code: reason.code,
        message: `Gross weight ${lb(reason.grossWeight)} is outside the ${designation} launch data (${lb(reason.lowest)} to ${lb(reason.highest)}).`,
      };
    case 'approved_setting_missing':
      return {
        code: reason.code,
        message:
          reason.highest === null
            ? `The approved launch data hold no ${input.configuration} setting table for the ${designation} on cat ${input.catapult.number}; the admin enters it on the Launch data screen.`
            : `Gross weight ${lb(reason.grossWeight)} is above the approved ${input.configuration} settings of the ${designation} on cat ${input.catapult.number} (up to ${lb(reason.highest)}).`,
      };
    case 'setting_out_of_range':
      return {
        code: reason.code,
        message: `The highest setting of cat ${input.catapult.number} gives ${kt(reason.maxEndSpeed)} end speed; ${kt(reason.wantedEndSpeed)} is wanted.`,
      };
  }
}

/**
 * One aircraft's figures on one catapult as the contracts carry them. launch-math decides every figure
 * and the verdict; this only words its reasons.
 */
export function launchFiguresView(input: FiguresInput): LaunchFigures {
  const figures = launchFigures({
    aircraft: aircraftProfile(input.type),
    catapult: catapultEnergy(input.catapult),
    grossWeight: pounds(input.grossWeightLb),
    conditions: { wind: input.wind, densityRatio: input.densityRatio, closedReason: input.closedReason },
    approved: {
      table: approvedSettingTable(input.type, input.catapult.number, input.configuration),
      crossCheckTolerance: input.crossCheckTolerance ?? DEFAULT_SETTING_CROSS_CHECK_TOLERANCE,
    },
  });
  return {
    headwindKt: figures.wind.headwind,
    crosswindKt: figures.wind.crosswind,
    crosswindSide: figures.wind.side,
    catapultSetting: figures.setting?.setting ?? null,
    crossCheckSetting: figures.crossCheck?.setting ?? null,
    crossCheckFlagged: figures.crossCheck?.flagged ?? null,
    endSpeedKt: figures.endSpeed,
    requiredAirspeedKt: figures.requiredAirspeed,
    requiredWindOverDeckKt: figures.requiredWindOverDeck,
    marginKt: figures.margin,
    excessWindOverDeckKt: figures.excessWindOverDeck,
    recommendedExcessKt: figures.recommendedExcess,
    go: figures.go,
    reasons: figures.reasons.map((reason) => describe(reason, input)),
    clearingTurnDeg: input.clearingTurnDeg,
  };
}
