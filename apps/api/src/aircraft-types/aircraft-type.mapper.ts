import type { AircraftTypeView } from '@catline/contracts';
import type { AircraftType } from '../database/entities/aircraft-type.entity.js';

export function toAircraftTypeView(type: AircraftType): AircraftTypeView {
  return {
    id: type.id,
    shipId: type.shipId,
    designation: type.designation,
    name: type.name,
    aircraftClass: type.aircraftClass,
    maxGrossWeightLb: type.maxGrossWeightLb,
    operatingWeightLb: type.operatingWeightLb,
    crosswindLimitKt: type.crosswindLimitKt,
    thrustLbf: type.thrustLbf,
    requiredExcessKt: type.requiredExcessKt,
    afterburnerFromLb: type.afterburnerFromLb,
    maxEndSpeedKt: type.maxEndSpeedKt,
    holdbackElement: type.holdbackElement,
    trimBands: type.trimBands,
    launchTable: type.launchTable,
    storesCatalogue: type.storesCatalogue,
    settingTables: type.settingTables,
  };
}
