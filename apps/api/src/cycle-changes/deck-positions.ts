import type { DeckLayout as DeckLayoutData, DeckPositionView, DeckSpot } from '@catline/contracts';
import {
  blockingAircraft,
  seconds,
  taxiTimeFrom,
  type DeckLayout,
  type DeckPosition,
  type TaxiTimes,
} from '@catline/launch-math';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Ship } from '../database/entities/ship.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';
import type { LineupState } from './lineup-state.js';

// Translations from the stored deck (ship's spots and layout, each slot's position) to launch-math's
// deck, and the questions the lineup asks of it. No rule is decided here.

/** A ship with no layout stored yet: no elevators or hangar bays, the waist catapults in the landing area. */
export const deckLayoutData = (ship: Ship, catapults: readonly Catapult[]): DeckLayoutData =>
  ship.deckLayout ?? {
    elevators: [],
    hangarBays: [],
    landingAreaCatapults: catapults.filter((catapult) => catapult.position === 'waist').map((c) => c.number),
  };

/** Where a taxi time goes in launch-math's layout: the key of its catapult, undefined for no catapult. */
type CatapultKey = (catapultNumber: number) => string | undefined;

const keyedTaxi = (taxiS: Record<number, number>, key: CatapultKey): TaxiTimes =>
  Object.fromEntries(
    Object.entries(taxiS).flatMap(([number, taxi]) => {
      const id = key(Number(number));
      return id === undefined ? [] : [[id, seconds(taxi)]];
    }),
  );

/** Spots and the rest of a deck for launch-math, each taxi time keyed by `key` of its catapult number. */
export function layoutOf(spots: readonly DeckSpot[], data: DeckLayoutData, key: CatapultKey): DeckLayout {
  const areas = [...new Set(spots.map((spot) => spot.area ?? spot.name))];
  return {
    // Every stored spot carries its own taxi times, so an area adds none of its own.
    areas: areas.map((id) => ({ id, taxi: {} })),
    spots: spots.map((spot) => ({
      id: spot.name,
      areaId: spot.area ?? spot.name,
      taxi: keyedTaxi(spot.taxiS, key),
      clearBefore: spot.clearBefore ?? [],
    })),
    elevators: data.elevators.map((elevator) => ({
      id: elevator.name,
      cycleTime: seconds(elevator.cycleS),
      taxi: keyedTaxi(elevator.taxiS, key),
    })),
    hangarBays: data.hangarBays.map((bay) => ({ id: bay.name, elevatorIds: bay.elevators })),
  };
}

/** The ship's deck for launch-math; catapults are keyed by their ids as strings, as in the projection. */
export function deckLayout(ship: Ship, catapults: readonly Catapult[]): DeckLayout {
  const ids = new Map(catapults.map((catapult) => [catapult.number, String(catapult.id)]));
  return layoutOf(ship.deckSpots, deckLayoutData(ship, catapults), (number) => ids.get(number));
}

/** Where a slot's aircraft is; a slot from before positions were kept is where its aircraft is parked. */
export function deckPositionView(slot: Slot): DeckPositionView {
  return slot.deckPositionName === ''
    ? { kind: 'spot', name: slot.aircraft.parkedSpot }
    : { kind: slot.deckPositionKind, name: slot.deckPositionName };
}

/**
 * Whether the aircraft is on its position: planned, down or scratched. One in the readiness steps has
 * taxied to its catapult and one launched is airborne; neither holds a spot.
 */
export const holdsPosition = (slot: Slot): boolean =>
  slot.status === 'planned' || slot.status === 'down' || slot.status === 'scratched';

/** Whether the ship's deck has the position. */
export function positionExists(ship: Pick<Ship, 'deckSpots' | 'deckLayout'>, position: DeckPositionView): boolean {
  const names =
    position.kind === 'spot'
      ? ship.deckSpots.map((spot) => spot.name)
      : position.kind === 'elevator'
        ? (ship.deckLayout?.elevators ?? []).map((elevator) => elevator.name)
        : (ship.deckLayout?.hangarBays ?? []).map((bay) => bay.name);
  return names.includes(position.name);
}

const asPosition = (view: DeckPositionView): DeckPosition => ({ kind: view.kind, id: view.name });

/** Taxi time (s) from where the aircraft is to a catapult; undefined when it cannot get there. */
export function taxiSeconds(
  state: LineupState,
  layout: DeckLayout,
  slot: Slot,
  catapult: Catapult,
): number | undefined {
  const position = deckPositionView(slot);
  if (!positionExists(state.ship, position)) return undefined;
  return taxiTimeFrom(layout, asPosition(position), String(catapult.id));
}

/**
 * The positions of the slots on theirs (by slot id as a string) for launch-math. Where two stand on one
 * spot or elevator (slots from before positions were kept start on their aircraft's parked spot, which
 * the fleet shares out), the first by id holds it and the other is left out of the deck's rules.
 */
export function heldPositions(state: LineupState): Record<string, DeckPosition> {
  const held = new Set<string>();
  const positions: Record<string, DeckPosition> = {};
  for (const slot of [...state.slots].sort((a, b) => a.id - b.id)) {
    if (!holdsPosition(slot)) continue;
    const view = deckPositionView(slot);
    const key = `${view.kind}:${view.name}`;
    if (!positionExists(state.ship, view) || (view.kind !== 'hangar' && held.has(key))) continue;
    held.add(key);
    positions[String(slot.id)] = asPosition(view);
  }
  return positions;
}

/**
 * For each slot on its position (by id as a string), the slots parked on the spots in front of it in
 * its row, which must taxi out (or be towed away) before it can leave.
 */
export function clearBefore(state: LineupState, layout: DeckLayout): Record<string, string[]> {
  return blockingAircraft(layout, heldPositions(state));
}
