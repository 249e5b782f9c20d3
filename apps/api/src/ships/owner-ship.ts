import type { EntityManager } from 'typeorm';
import type { ShipScope } from '../common/ship-scope.js';
import { Ship } from '../database/entities/ship.entity.js';
import { ShipsException } from './ships.exception.js';

/**
 * The ship a new person, squadron or aircraft type belongs to: the caller's own (a `shipId` naming
 * another ship is answered as a ship that does not exist); a fleet admin must name an existing ship.
 */
export async function ownerShip(
  manager: EntityManager,
  scope: ShipScope,
  requested: number | undefined,
): Promise<number> {
  if (scope.shipId !== null) {
    if (requested !== undefined && requested !== scope.shipId) throw shipNotFound(requested);
    return scope.shipId;
  }
  if (requested === undefined) {
    throw new ShipsException('ship_required', 'You work for the whole fleet: say which ship this belongs to (shipId).');
  }
  if (!(await manager.existsBy(Ship, { id: requested }))) throw shipNotFound(requested);
  return requested;
}

export function shipNotFound(id: number): ShipsException {
  return new ShipsException('ship_not_found', `There is no ship with id ${id}.`);
}
