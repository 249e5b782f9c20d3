import type { CycleView } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';

export interface CycleCounts {
  slotCount: number;
  launchedCount: number;
}

export function toCycleView(cycle: Cycle, counts: CycleCounts): CycleView {
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
    landingAreaInUse: cycle.landingAreaInUse,
    landingArea: cycle.landingArea,
    landingAreaReason: cycle.landingAreaReason,
    state: cycle.state,
    version: cycle.version,
    slotCount: counts.slotCount,
    launchedCount: counts.launchedCount,
  };
}
