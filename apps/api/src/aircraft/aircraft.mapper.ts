import type { AircraftView } from '@catline/contracts';
import type { Aircraft } from '../database/entities/aircraft.entity.js';

/** Needs the aircraft loaded with its type and squadron. */
export function toAircraftView(aircraft: Aircraft): AircraftView {
  return {
    id: aircraft.id,
    sideNumber: aircraft.sideNumber,
    typeId: aircraft.typeId,
    typeDesignation: aircraft.type.designation,
    squadronId: aircraft.squadronId,
    squadronCode: aircraft.squadron.code,
    parkedSpot: aircraft.parkedSpot,
    serviceable: aircraft.serviceable,
    catapultShots: aircraft.catapultShots,
  };
}
