import type { DeckSpot, ReplaceDeckLayoutRequest, ShipView } from '@catline/contracts';

/** Seconds to each catapult as typed, by catapult number; blank where none is given. */
export type DraftTaxi = Record<number, string>;

export interface DraftSpot {
  name: string;
  /** The spots in front of it in its row, as typed: names separated by commas. */
  clearBefore: string;
  taxi: DraftTaxi;
}

export interface DraftArea {
  name: string;
  /** Times to copy into every spot of the area at once; the ship keeps each spot's own. */
  taxi: DraftTaxi;
  spots: DraftSpot[];
}

export interface DraftElevator {
  name: string;
  cycleS: string;
  taxi: DraftTaxi;
}

export interface DeckDraft {
  areas: DraftArea[];
  elevators: DraftElevator[];
}

const typedTaxi = (taxiS: Record<number, number>, catapults: readonly number[]): DraftTaxi =>
  Object.fromEntries(catapults.map((number) => [number, taxiS[number] === undefined ? '' : String(taxiS[number])]));

const blankTaxi = (catapults: readonly number[]): DraftTaxi =>
  Object.fromEntries(catapults.map((number) => [number, '']));

export const catapultNumbers = (ship: ShipView): number[] =>
  ship.catapults.map((catapult) => catapult.number).sort((a, b) => a - b);

/** The ship's deck as the editor holds it: spots grouped in their areas, in the order the ship gives them. */
export function toDeckDraft(ship: ShipView): DeckDraft {
  const catapults = catapultNumbers(ship);
  const areas: DraftArea[] = [];
  for (const spot of ship.deckSpots) {
    const areaName = spot.area ?? spot.name;
    let area = areas.find((candidate) => candidate.name === areaName);
    if (!area) {
      area = { name: areaName, taxi: blankTaxi(catapults), spots: [] };
      areas.push(area);
    }
    area.spots.push({
      name: spot.name,
      clearBefore: (spot.clearBefore ?? []).join(', '),
      taxi: typedTaxi(spot.taxiS, catapults),
    });
  }
  return {
    areas,
    elevators: ship.deckLayout.elevators.map((elevator) => ({
      name: elevator.name,
      cycleS: String(elevator.cycleS),
      taxi: typedTaxi(elevator.taxiS, catapults),
    })),
  };
}

export const blankSpot = (catapults: readonly number[]): DraftSpot => ({
  name: '',
  clearBefore: '',
  taxi: blankTaxi(catapults),
});

export const blankArea = (catapults: readonly number[]): DraftArea => ({
  name: '',
  taxi: blankTaxi(catapults),
  spots: [blankSpot(catapults)],
});

/** The area's typed times copied into each of its spots; a blank area time leaves the spots' own. */
export function applyAreaTaxi(area: DraftArea): DraftArea {
  const given = Object.entries(area.taxi).filter(([, typed]) => typed.trim() !== '');
  return {
    ...area,
    spots: area.spots.map((spot) => ({ ...spot, taxi: { ...spot.taxi, ...Object.fromEntries(given) } })),
  };
}

/** Moves an item one place up (-1) or down (+1); at an end the list stays as it is. */
export function moved<T>(list: readonly T[], index: number, by: -1 | 1): T[] {
  const to = index + by;
  if (to < 0 || to >= list.length) return [...list];
  const next = [...list];
  [next[index], next[to]] = [next[to], next[index]];
  return next;
}

const SECONDS = /^-?\d+(\.\d+)?$/;

/**
 * Typed seconds to the catapults: a blank is left out (the server names the catapult then); anything
 * else must read as a number, negative included, since whether it may be below 0 is the server's rule.
 */
function parsedTaxi(taxi: DraftTaxi, where: string): Record<number, number> | string {
  const seconds: Record<number, number> = {};
  for (const [number, typed] of Object.entries(taxi)) {
    const text = typed.trim();
    if (text === '') continue;
    if (!SECONDS.test(text)) return `The taxi time from ${where} to catapult ${number} must be a number of seconds.`;
    seconds[Number(number)] = Number(text);
  }
  return seconds;
}

/** The request that replaces the ship's deck, or the sentence saying what to fix first. */
export function toDeckLayoutRequest(
  draft: DeckDraft,
  ship: ShipView,
): { request: ReplaceDeckLayoutRequest } | { problem: string } {
  const deckSpots: DeckSpot[] = [];
  for (const area of draft.areas) {
    const areaName = area.name.trim();
    if (areaName === '') return { problem: 'Every deck area needs a name.' };
    for (const spot of area.spots) {
      const name = spot.name.trim();
      if (name === '') return { problem: `Every spot of area ${areaName} needs a name.` };
      const taxiS = parsedTaxi(spot.taxi, `spot ${name}`);
      if (typeof taxiS === 'string') return { problem: taxiS };
      const clearBefore = spot.clearBefore
        .split(',')
        .map((front) => front.trim())
        .filter((front) => front !== '');
      deckSpots.push({ name, area: areaName, ...(clearBefore.length > 0 ? { clearBefore } : {}), taxiS });
    }
  }
  const elevators = [];
  for (const elevator of draft.elevators) {
    const name = elevator.name.trim();
    if (name === '') return { problem: 'Every elevator needs a name.' };
    if (!SECONDS.test(elevator.cycleS.trim())) {
      return { problem: `The trip time of elevator ${name} must be a number of seconds.` };
    }
    const taxiS = parsedTaxi(elevator.taxi, `elevator ${name}`);
    if (typeof taxiS === 'string') return { problem: taxiS };
    elevators.push({ name, cycleS: Number(elevator.cycleS.trim()), taxiS });
  }
  return {
    request: {
      deckSpots,
      elevators,
      hangarBays: ship.deckLayout.hangarBays,
      landingAreaCatapults: ship.deckLayout.landingAreaCatapults,
    },
  };
}

/**
 * The server's refusal details ("spot bow-1: <sentence>") by the part they name, so each sentence can
 * stand beside its spot or elevator; a detail naming none is kept under ''.
 */
export function problemsByPart(details: readonly string[] | undefined): Map<string, string[]> {
  const byPart = new Map<string, string[]>();
  for (const detail of details ?? []) {
    const at = detail.indexOf(': ');
    const [part, sentence] = at < 0 ? ['', detail] : [detail.slice(0, at), detail.slice(at + 2)];
    byPart.set(part, [...(byPart.get(part) ?? []), sentence]);
  }
  return byPart;
}
