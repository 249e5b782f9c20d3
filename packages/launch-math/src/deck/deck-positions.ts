import { LaunchMathInputError, requireNonNegative } from '../errors.js';
import type { Seconds } from '../units/units.js';

/** Where an aircraft is: a deck spot, on an elevator at flight-deck level, or in a hangar bay. */
export type DeckPosition =
  | { readonly kind: 'spot'; readonly id: string }
  | { readonly kind: 'elevator'; readonly id: string }
  | { readonly kind: 'hangar'; readonly id: string };

/** Taxi time in seconds to each catapult, keyed by catapult id; a missing catapult cannot be reached. */
export type TaxiTimes = Readonly<Record<string, Seconds>>;

export interface DeckArea {
  readonly id: string;
  /** Taxi time from any spot of the area to each catapult, unless the spot gives its own. */
  readonly taxi: TaxiTimes;
}

export interface DeckSpotLayout {
  readonly id: string;
  readonly areaId: string;
  /** The spot's own taxi times, where they differ from its area's. */
  readonly taxi?: TaxiTimes;
  /** Spots in front of this one in its row: they must be clear before an aircraft here can taxi out. */
  readonly clearBefore?: readonly string[];
}

export interface ElevatorLayout {
  readonly id: string;
  /** One trip between the hangar deck and the flight deck, seconds. */
  readonly cycleTime: Seconds;
  /** Taxi time from the elevator at flight-deck level to each catapult. */
  readonly taxi: TaxiTimes;
}

export interface HangarBayLayout {
  readonly id: string;
  /** The elevators an aircraft in this bay can be brought up on. */
  readonly elevatorIds: readonly string[];
}

/** The ship's deck as the timing sees it. */
export interface DeckLayout {
  readonly areas: readonly DeckArea[];
  readonly spots: readonly DeckSpotLayout[];
  readonly elevators: readonly ElevatorLayout[];
  readonly hangarBays: readonly HangarBayLayout[];
}

const findIn = <T extends { readonly id: string }>(list: readonly T[], id: string, what: string): T => {
  const found = list.find((item) => item.id === id);
  if (found === undefined) throw new LaunchMathInputError(`Unknown ${what} ${id}`);
  return found;
};

const checked = (taxi: Seconds | undefined, what: string): Seconds | undefined => {
  if (taxi !== undefined) requireNonNegative(taxi, what);
  return taxi;
};

/**
 * Time (s) from a position until the aircraft can be at a catapult: the taxi time from its spot (the
 * spot's own, else its area's) or from the elevator at flight-deck level; from a hangar bay, one
 * elevator trip up plus that elevator's taxi, by whichever of the bay's elevators is quickest.
 * `undefined` when the catapult cannot be reached from there.
 */
export function taxiTimeFrom(layout: DeckLayout, position: DeckPosition, catapultId: string): Seconds | undefined {
  switch (position.kind) {
    case 'spot': {
      const spot = findIn(layout.spots, position.id, 'deck spot');
      const area = findIn(layout.areas, spot.areaId, 'deck area');
      return checked(spot.taxi?.[catapultId] ?? area.taxi[catapultId], `Taxi time from spot ${spot.id} (s)`);
    }
    case 'elevator': {
      const elevator = findIn(layout.elevators, position.id, 'elevator');
      return checked(elevator.taxi[catapultId], `Taxi time from elevator ${elevator.id} (s)`);
    }
    case 'hangar': {
      const bay = findIn(layout.hangarBays, position.id, 'hangar bay');
      let best: number | undefined;
      for (const elevatorId of bay.elevatorIds) {
        const elevator = findIn(layout.elevators, elevatorId, 'elevator');
        requireNonNegative(elevator.cycleTime, `Cycle time of elevator ${elevator.id} (s)`);
        const taxi = checked(elevator.taxi[catapultId], `Taxi time from elevator ${elevator.id} (s)`);
        if (taxi !== undefined && (best === undefined || elevator.cycleTime + taxi < best)) {
          best = elevator.cycleTime + taxi;
        }
      }
      return best as Seconds | undefined;
    }
  }
}

/** Taxi times from a position to every catapult it can reach. */
export function taxiTimesFrom(layout: DeckLayout, position: DeckPosition, catapultIds: readonly string[]): TaxiTimes {
  const times: Record<string, Seconds> = {};
  for (const catapultId of catapultIds) {
    const taxi = taxiTimeFrom(layout, position, catapultId);
    if (taxi !== undefined) times[catapultId] = taxi;
  }
  return times;
}

/**
 * For each aircraft on a deck spot, the aircraft on the spots in front of it that must be clear before
 * it can taxi out (its spot's clear-before list). Aircraft on elevators or below block no one here.
 */
export function blockingAircraft(
  layout: DeckLayout,
  positions: Readonly<Record<string, DeckPosition>>,
): Record<string, string[]> {
  const onSpot = new Map<string, string>();
  for (const [aircraftId, position] of Object.entries(positions)) {
    if (position.kind !== 'spot') continue;
    const holder = onSpot.get(position.id);
    if (holder !== undefined) {
      throw new LaunchMathInputError(`Aircraft ${holder} and ${aircraftId} are both on spot ${position.id}`);
    }
    onSpot.set(position.id, aircraftId);
  }
  const blockers: Record<string, string[]> = {};
  for (const [spotId, aircraftId] of onSpot) {
    const spot = findIn(layout.spots, spotId, 'deck spot');
    const ahead = (spot.clearBefore ?? []).flatMap((front) => {
      const holder = onSpot.get(front);
      return holder === undefined ? [] : [holder];
    });
    if (ahead.length > 0) blockers[aircraftId] = ahead;
  }
  return blockers;
}

/** What stands in the way of one tow; all empty when it can go now. */
export interface TowBlockers {
  /** The aircraft already on the target spot or elevator. */
  readonly occupiedBy: string | null;
  /** Aircraft in front of the spot it leaves or enters, or on every elevator between hangar and deck. */
  readonly mustMove: readonly string[];
  /** The target cannot be reached from where the aircraft is (a hangar bay its elevator does not serve). */
  readonly noRoute: boolean;
}

/**
 * Whether an aircraft can be towed from where it is to `target` now: the target is free (a hangar bay
 * holds any number); it does not leave a spot past aircraft parked in front of it, nor enter one past
 * aircraft in front of that; between hangar and flight deck it needs an elevator of the bay that is
 * free (or the one it stands on).
 */
export function towBlockers(
  layout: DeckLayout,
  positions: Readonly<Record<string, DeckPosition>>,
  aircraftId: string,
  target: DeckPosition,
): TowBlockers {
  const from = positions[aircraftId];
  if (from === undefined) throw new LaunchMathInputError(`Aircraft ${aircraftId} has no position`);
  const holderOf = (position: DeckPosition): string | undefined =>
    Object.keys(positions).find(
      (other) => other !== aircraftId && positions[other].kind === position.kind && positions[other].id === position.id,
    );
  const inFront = (spotId: string): string[] =>
    (findIn(layout.spots, spotId, 'deck spot').clearBefore ?? []).flatMap((front) => {
      const holder = holderOf({ kind: 'spot', id: front });
      return holder === undefined ? [] : [holder];
    });

  const occupiedBy = target.kind === 'hangar' ? null : (holderOf(target) ?? null);
  const mustMove = new Set<string>();
  if (from.kind === 'spot') inFront(from.id).forEach((holder) => mustMove.add(holder));
  if (target.kind === 'spot') inFront(target.id).forEach((holder) => mustMove.add(holder));

  let noRoute = false;
  const bay = from.kind === 'hangar' ? from : target.kind === 'hangar' ? target : null;
  const other = bay === from ? target : from;
  if (bay !== null && other.kind !== 'hangar') {
    const elevators = findIn(layout.hangarBays, bay.id, 'hangar bay').elevatorIds;
    if (other.kind === 'elevator') noRoute = !elevators.includes(other.id);
    else {
      const holders = elevators.map((id) => holderOf({ kind: 'elevator', id }));
      if (elevators.length === 0) noRoute = true;
      else if (holders.every((holder) => holder !== undefined)) holders.forEach((holder) => mustMove.add(holder!));
    }
  }
  return { occupiedBy, mustMove: [...mustMove], noRoute };
}
