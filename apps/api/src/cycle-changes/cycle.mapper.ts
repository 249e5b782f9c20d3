import { DEFAULT_WIND_READING_MAX_AGE_MIN, shipTimeZone, type CycleView, type ShipProfile } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';
import { launchPrerequisitesOf } from './launch-prerequisites.js';

export interface CycleCounts {
  slotCount: number;
  launchedCount: number;
}

/** When a wind reading taken at `readAt` turns stale by the ship profile's age. */
export const windStaleAt = (readAt: Date, profile: ShipProfile): Date =>
  new Date(readAt.getTime() + (profile.windReadingMaxAgeMin ?? DEFAULT_WIND_READING_MAX_AGE_MIN) * 60_000);

export function toCycleView(cycle: Cycle, profile: ShipProfile, counts: CycleCounts): CycleView {
  return {
    id: cycle.id,
    shipId: cycle.shipId,
    number: cycle.number,
    plannedLaunchAt: cycle.plannedLaunchAt.toISOString(),
    windowStartAt: cycle.windowStartAt.toISOString(),
    windowEndAt: cycle.windowEndAt.toISOString(),
    shipCourseDeg: cycle.shipCourseDeg,
    shipSpeedKt: cycle.shipSpeedKt,
    trueWindFromDeg: cycle.trueWindFromDeg,
    trueWindSpeedKt: cycle.trueWindSpeedKt,
    temperatureC: cycle.temperatureC,
    pressureHpa: cycle.pressureHpa,
    weatherCase: cycle.weatherCase,
    night: cycle.night,
    landingArea: cycle.landingArea,
    landingAreaReason: cycle.landingAreaReason,
    respot: cycle.respot,
    state: cycle.state,
    version: cycle.version,
    slotCount: counts.slotCount,
    launchedCount: counts.launchedCount,
    windGustFromDeg: cycle.windGustFromDeg,
    windGustKt: cycle.windGustKt,
    windLullFromDeg: cycle.windLullFromDeg,
    windLullKt: cycle.windLullKt,
    windReadAt: cycle.windReadAt.toISOString(),
    windStaleAt: windStaleAt(cycle.windReadAt, profile).toISOString(),
    latitudeDeg: cycle.latitudeDeg,
    longitudeDeg: cycle.longitudeDeg,
    timeZone: shipTimeZone(profile),
    launchPrerequisites: launchPrerequisitesOf(cycle, profile),
  };
}
