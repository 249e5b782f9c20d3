import type { LaunchConfiguration, ShipProfile as ShipProfileData, WeatherCase } from '@catline/contracts';
import {
  airDensity,
  celsius,
  celsiusToKelvin,
  degrees,
  densityRatio,
  knots,
  megajoulesToJoules,
  metres,
  pascals,
  pounds,
  poundsForce,
  relativeWind,
  seconds,
  type AircraftProfile,
  type ApprovedSettingTable,
  type CatapultEnergyProfile,
  type ClearingTurn,
  type LaunchCatapult,
  type RelativeWind,
  type ShipProfile,
} from '@catline/launch-math';
import type { AircraftType } from '../database/entities/aircraft-type.entity.js';
import type { Cycle } from '../database/entities/cycle.entity.js';
import type { Catapult } from '../database/entities/catapult.entity.js';

// Translations from the stored data to @catline/launch-math's inputs. No figure is computed here.

const PASCALS_PER_HECTOPASCAL = 100;

/**
 * The stored trim bands give each band's highest weight (inclusive, whole pounds); launch-math wants
 * each band's lowest weight. Weights are whole pounds, so a band starts one pound above the last one's top.
 */
export function aircraftProfile(type: AircraftType): AircraftProfile {
  return {
    maxGrossWeight: pounds(type.maxGrossWeightLb),
    crosswindLimit: knots(type.crosswindLimitKt),
    thrust: poundsForce(type.thrustLbf),
    requiredExcess: knots(type.requiredExcessKt),
    minimumLaunchAirspeed: type.launchTable.map((row) => ({
      grossWeight: pounds(row.grossWeightLb),
      airspeed: knots(row.minLaunchAirspeedKt),
    })),
    trimBands: type.trimBands.map((band, index) => ({
      fromGrossWeight: pounds(index === 0 ? 0 : (type.trimBands[index - 1].upToLb ?? 0) + 1),
      trim: degrees(band.trimDeg),
    })),
    trimWeightStep: pounds(1),
    afterburnerFromGrossWeight: type.afterburnerFromLb === null ? null : pounds(type.afterburnerFromLb),
  };
}

/** The type's approved setting table for a catapult (by number) and configuration; null when the ship holds none. */
export function approvedSettingTable(
  type: AircraftType,
  catapultNumber: number,
  configuration: LaunchConfiguration,
): ApprovedSettingTable | null {
  const table = type.settingTables.find(
    (candidate) => candidate.catapultNumber === catapultNumber && candidate.configuration === configuration,
  );
  return table
    ? {
        recommendedExcess: knots(table.recommendedExcessKt),
        rows: table.rows.map((row) => ({ upToWeight: pounds(row.upToLb), setting: row.setting })),
      }
    : null;
}

/** `settingCount` discrete settings, numbered 0 (lowest energy) to settingCount - 1 (highest). */
export function catapultEnergy(catapult: Catapult): CatapultEnergyProfile {
  return {
    strokeLength: metres(catapult.strokeM),
    energyAtMinSetting: megajoulesToJoules(catapult.energyMinMj),
    energyAtMaxSetting: megajoulesToJoules(catapult.energyMaxMj),
    maxSetting: Math.max(1, catapult.settingCount - 1),
  };
}

/** `inLandingArea`: whether the ship marks the catapult inside the landing area (else: waist catapults). */
export function launchCatapult(catapult: Catapult, inLandingArea?: boolean): LaunchCatapult {
  return {
    inLandingArea,
    id: String(catapult.id),
    number: catapult.number,
    position: catapult.position,
    pairId: String(catapult.pair),
    resetInterval: seconds(catapult.resetIntervalS),
    up: catapult.status === 'up',
  };
}

const signedToTurn = (deg: number): ClearingTurn => ({
  direction: deg > 0 ? 'right' : deg < 0 ? 'left' : 'none',
  degrees: degrees(Math.abs(deg)),
});

/** The ship’s stored profile (signed turns for cases I and II, departures as text) in launch-math’s form. */
export function shipProfile(profile: ShipProfileData): ShipProfile {
  const departure = (summary: string) => ({ summary, altitude: null, untilRange: null, speed: null });
  const departures = (weatherCase: WeatherCase) => {
    const byClass = profile.departures[weatherCase];
    return {
      jet: departure(byClass.jet),
      turboprop: departure(byClass.turboprop),
      helicopter: departure(byClass.helicopter),
    };
  };
  return {
    clearingTurns: {
      bow: signedToTurn(profile.clearingTurnDeg.bow),
      waist: signedToTurn(profile.clearingTurnDeg.waist),
    },
    departures: { I: departures('I'), II: departures('II'), III: departures('III') },
  };
}

/** Degrees of turn, positive to starboard, as the contracts carry it. */
export const signedTurn = (turn: ClearingTurn): number =>
  turn.direction === 'right' ? turn.degrees : turn.direction === 'left' ? -turn.degrees : 0;

/**
 * The wind across the deck the launch figures rest on: the reading's lull, so the minimum headwind holds
 * when the wind drops (common practice, no source).
 */
export function cycleRelativeWind(cycle: Cycle): RelativeWind {
  return relativeWind(
    { course: degrees(cycle.shipCourseDeg), speed: knots(cycle.shipSpeedKt) },
    { from: degrees(cycle.windLullFromDeg), speed: knots(cycle.windLullKt) },
  );
}

export function cycleDensityRatio(cycle: Cycle): number {
  return densityRatio(
    airDensity(celsiusToKelvin(celsius(cycle.temperatureC)), pascals(cycle.pressureHpa * PASCALS_PER_HECTOPASCAL)),
  );
}
