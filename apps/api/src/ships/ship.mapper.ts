import type { CatapultView, ShipView } from '@catline/contracts';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Ship } from '../database/entities/ship.entity.js';
import { deckLayoutData } from '../cycle-changes/deck-positions.js';

export function toCatapultView(catapult: Catapult): CatapultView {
  return {
    id: catapult.id,
    shipId: catapult.shipId,
    number: catapult.number,
    position: catapult.position,
    axisAngleDeg: catapult.axisAngleDeg,
    strokeM: catapult.strokeM,
    energyMinMj: catapult.energyMinMj,
    energyMaxMj: catapult.energyMaxMj,
    settingCount: catapult.settingCount,
    resetIntervalS: catapult.resetIntervalS,
    pair: catapult.pair,
    status: catapult.status,
    shotCount: catapult.shotCount,
    readinessSteps: catapult.readinessSteps,
  };
}

/** The ship with its catapults in number order. */
export function toShipView(ship: Ship, catapults: Catapult[]): ShipView {
  return {
    id: ship.id,
    name: ship.name,
    hullCode: ship.hullCode,
    pairGapS: ship.pairGapS,
    profile: ship.profile,
    deckSpots: ship.deckSpots,
    deckLayout: deckLayoutData(ship, catapults),
    catapults: [...catapults].sort((a, b) => a.number - b.number).map(toCatapultView),
  };
}
