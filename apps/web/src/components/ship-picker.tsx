import { useState } from 'react';
import type { ShipView } from '@catline/contracts';
import { useShips } from '../lib/queries/ships-query.js';
import { FormField } from './form-field.js';
import { SelectInput } from './select-field.js';

// A ship's admin sees their own ship only (GET /ships is kept to the caller's ship), so a choice of ship
// is offered only to a fleet admin, who sees them all. Either way the request names the ship: the
// server takes a ship's admin's own ship as named and refuses a fleet admin a new row with no ship.

export interface ShipChoice {
  ships: ShipView[];
  /** The chosen ship, or the only one; undefined while the ships load. */
  ship: ShipView | undefined;
  choose: (shipId: number) => void;
}

export const shipLabel = (ship: ShipView) => `${ship.name} (${ship.hullCode})`;

/** The ship chosen at first (the first listed unless told), then as the person picks. */
export function useShipChoice(initial?: number): ShipChoice {
  const ships = useShips().data ?? [];
  const [picked, choose] = useState(initial);
  return { ships, ship: ships.find((ship) => ship.id === picked) ?? ships[0], choose };
}

/**
 * The rows that belong to the ship, none while the ships load: a fleet admin lists every ship's squadrons
 * and types, and the server refuses a row that points at another ship's, so a form offers only these.
 */
export const ofShip = <Row extends { shipId: number }>(rows: Row[], ship: ShipView | undefined): Row[] =>
  rows.filter((row) => row.shipId === ship?.id);

/** A labelled select of the ships, shown only when there is more than one to choose from. */
export function ShipPicker({
  choice,
  label,
}: {
  choice: Pick<ShipChoice, 'ships' | 'ship' | 'choose'>;
  label: string;
}) {
  if (choice.ships.length < 2) return null;
  return (
    <FormField label={label}>
      <SelectInput
        value={choice.ship ? String(choice.ship.id) : ''}
        choices={choice.ships.map((ship) => ({ value: String(ship.id), label: shipLabel(ship) }))}
        onChange={(value) => choice.choose(Number(value))}
      />
    </FormField>
  );
}
