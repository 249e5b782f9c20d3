/**
 * Which ship's data a person may read and change: their own ship's, or every ship's for a fleet admin
 * (shipId null). Every service that lists, reads or changes ship-owned rows (people, squadrons, aircraft,
 * types and their launch data, cycles) filters with these, so a row of another ship is simply not
 * found: the caller gets a 404, never a 403 that would tell them the id exists.
 */
export interface ShipScope {
  /** The caller's ship; null for a fleet admin. */
  readonly shipId: number | null;
}

/** The whole fleet: for work nobody in particular asked for (seeds, the mail sender, the respot's timers). */
export const WHOLE_FLEET: ShipScope = { shipId: null };

/** A where-clause part keeping a TypeORM query to the scope's ship (nothing for the whole fleet). */
export function shipWhere(scope: ShipScope): { shipId?: number } {
  return scope.shipId === null ? {} : { shipId: scope.shipId };
}

/** Whether a row of `shipId` lies in the scope. */
export function inShipScope(scope: ShipScope, shipId: number): boolean {
  return scope.shipId === null || scope.shipId === shipId;
}
