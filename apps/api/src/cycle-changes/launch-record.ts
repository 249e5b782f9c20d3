import type { ChangeActor, LaunchFigures, LaunchRecord, WindReadingUsed } from '@catline/contracts';
import { degrees, knots, relativeWind } from '@catline/launch-math';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Cycle } from '../database/entities/cycle.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';

/** What the launch command had in hand at the shot. */
export interface ShotInput {
  cycle: Cycle;
  slot: Slot;
  catapult: Catapult;
  /** The figures the go/no-go was decided on, under the conditions in force. */
  figures: LaunchFigures;
  trimDeg: number | null;
  afterburnerRequired: boolean;
  waiver: string | null;
  firedBy: ChangeActor;
  at: Date;
}

/** The wind reading in force as a cycle holds it; null where the source kept no spread or time of reading. */
export type WindInForce = Pick<
  WindReadingUsed,
  'shipCourseDeg' | 'shipSpeedKt' | 'trueWindFromDeg' | 'trueWindSpeedKt' | 'temperatureC' | 'pressureHpa'
> & {
  windGustFromDeg: number | null;
  windGustKt: number | null;
  windLullFromDeg: number | null;
  windLullKt: number | null;
  windReadAt: string | null;
};

/**
 * The whole reading as a record freezes it: with the steady wind across the deck worked out from the ship's
 * course and speed, so that a record says what the deck felt without computing it again later.
 */
export function windReadingUsed(wind: WindInForce): WindReadingUsed {
  const across = relativeWind(
    { course: degrees(wind.shipCourseDeg), speed: knots(wind.shipSpeedKt) },
    { from: degrees(wind.trueWindFromDeg), speed: knots(wind.trueWindSpeedKt) },
  );
  return {
    readAt: wind.windReadAt,
    shipCourseDeg: wind.shipCourseDeg,
    shipSpeedKt: wind.shipSpeedKt,
    trueWindFromDeg: wind.trueWindFromDeg,
    trueWindSpeedKt: wind.trueWindSpeedKt,
    windGustFromDeg: wind.windGustFromDeg,
    windGustKt: wind.windGustKt,
    windLullFromDeg: wind.windLullFromDeg,
    windLullKt: wind.windLullKt,
    relativeWindBearingDeg: across.bearing,
    relativeWindSpeedKt: across.speed,
    temperatureC: wind.temperatureC,
    pressureHpa: wind.pressureHpa,
  };
}

/**
 * The launch record of a shot: the figures the command decided on, copied, so that nothing read
 * later (a new wind, a changed launch table) can alter what the record says was used.
 */
export function recordShot(input: ShotInput): LaunchRecord {
  const { cycle, slot, catapult, figures } = input;
  return {
    source: 'shot',
    launchedAt: input.at.toISOString(),
    catapultId: catapult.id,
    catapultNumber: catapult.number,
    // The weight the crew recorded as agreed with the pilot, which the setting was worked out for.
    grossWeightLb: slot.agreedWeightLb ?? slot.grossWeightLb,
    fuelLb: slot.fuelLb,
    stores: slot.stores,
    // The setting the crew set and read back, and the energy model's estimate it was checked against.
    launchDataSetting: figures.catapultSetting,
    crossCheckSetting: figures.crossCheckSetting,
    windReading: windReadingUsed({ ...cycle, windReadAt: cycle.windReadAt.toISOString() }),
    headwindKt: figures.headwindKt,
    crosswindKt: figures.crosswindKt,
    crosswindSide: figures.crosswindSide,
    endSpeedKt: figures.endSpeedKt,
    requiredAirspeedKt: figures.requiredAirspeedKt,
    requiredWindOverDeckKt: figures.requiredWindOverDeckKt,
    excessWindKt: figures.marginKt,
    excessWindOverDeckKt: figures.excessWindOverDeckKt,
    recommendedExcessKt: figures.recommendedExcessKt,
    go: figures.go,
    reasons: figures.reasons,
    trimDeg: input.trimDeg,
    afterburnerRequired: input.afterburnerRequired,
    clearingTurnDeg: figures.clearingTurnDeg,
    waiver: input.waiver,
    firedBy: { id: input.firedBy.id, name: input.firedBy.name, role: input.firedBy.role },
  };
}

/**
 * A launched slot's figures as its record froze them; null for a rebuilt record whose change log
 * kept no figures (they are not worked out again from today's conditions).
 */
export function recordedFigures(record: LaunchRecord): LaunchFigures | null {
  if (record.headwindKt === null || record.crosswindKt === null || record.endSpeedKt === null) return null;
  return {
    headwindKt: record.headwindKt,
    crosswindKt: record.crosswindKt,
    crosswindSide: record.crosswindSide ?? 'none',
    // A shot before the approved data gave settings was set to the energy model's.
    catapultSetting: record.launchDataSetting ?? record.crossCheckSetting,
    crossCheckSetting: record.crossCheckSetting,
    // The tolerance of the moment was not kept.
    crossCheckFlagged: null,
    endSpeedKt: record.endSpeedKt,
    requiredAirspeedKt: record.requiredAirspeedKt,
    requiredWindOverDeckKt: record.requiredWindOverDeckKt,
    marginKt: record.excessWindKt,
    excessWindOverDeckKt: record.excessWindOverDeckKt,
    recommendedExcessKt: record.recommendedExcessKt,
    go: record.go ?? false,
    reasons: record.reasons,
    clearingTurnDeg: record.clearingTurnDeg ?? 0,
  };
}
