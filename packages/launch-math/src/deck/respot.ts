import { LaunchMathInputError } from '../errors.js';
import { towBlockers, type DeckLayout, type DeckPosition } from './deck-positions.js';

/** One tow of a respot, in the order the deck crew makes them. */
export interface RespotTow {
  readonly aircraftId: string;
  readonly from: DeckPosition;
  readonly to: DeckPosition;
}

/** An aircraft the respot cannot bring to its target, and the aircraft in its way. */
export interface StuckAircraft {
  readonly aircraftId: string;
  readonly mustMove: readonly string[];
}

export interface RespotPlan {
  readonly tows: readonly RespotTow[];
  /** Empty when every aircraft reaches its target. */
  readonly stuck: readonly StuckAircraft[];
}

const same = (a: DeckPosition, b: DeckPosition) => a.kind === b.kind && a.id === b.id;
const keyOf = (position: DeckPosition) => `${position.kind}:${position.id}`;

/**
 * Positions that more than one aircraft would hold once the respot is done (a hangar bay holds any
 * number): each with the aircraft that would share it. Aircraft without a target stay where they are;
 * `reserved` are the targets of aircraft still airborne, which land there after the respot.
 */
export function respotConflicts(
  positions: Readonly<Record<string, DeckPosition>>,
  targets: Readonly<Record<string, DeckPosition>>,
  reserved: Readonly<Record<string, DeckPosition>> = {},
): { position: DeckPosition; aircraftIds: string[] }[] {
  const holders = new Map<string, { position: DeckPosition; aircraftIds: string[] }>();
  const hold = (aircraftId: string, position: DeckPosition) => {
    if (position.kind === 'hangar') return;
    const entry = holders.get(keyOf(position)) ?? { position, aircraftIds: [] };
    entry.aircraftIds.push(aircraftId);
    holders.set(keyOf(position), entry);
  };
  for (const [aircraftId, position] of Object.entries(positions)) hold(aircraftId, targets[aircraftId] ?? position);
  for (const [aircraftId, position] of Object.entries(reserved)) hold(aircraftId, position);
  return [...holders.values()].filter((entry) => entry.aircraftIds.length > 1);
}

/**
 * The respot as an ordered list of tows, each allowed by {@link towBlockers} at its turn: never into a
 * position still held, never out of or into a spot past aircraft parked in front of it, hangar and deck
 * joined by a free elevator. At each turn it takes the first tow (in the targets' order) that can go and
 * leaves no other pending aircraft shut in behind it; one that would shut some in waits while another
 * can go. When no tow can go (two aircraft swapping places), one of them is first towed to a free spot
 * that is nobody's target, else to a hangar bay. Aircraft that still cannot reach their target are
 * returned as stuck with the aircraft that stand in their way.
 */
export function respotTows(
  layout: DeckLayout,
  positions: Readonly<Record<string, DeckPosition>>,
  targets: Readonly<Record<string, DeckPosition>>,
  reserved: Readonly<Record<string, DeckPosition>> = {},
): RespotPlan {
  for (const aircraftId of Object.keys(targets)) {
    if (positions[aircraftId] === undefined) throw new LaunchMathInputError(`Aircraft ${aircraftId} has no position`);
  }
  const conflicts = respotConflicts(positions, targets, reserved);
  if (conflicts.length > 0) {
    const [{ position, aircraftIds }] = conflicts;
    throw new LaunchMathInputError(`Aircraft ${aircraftIds.join(' and ')} would both be on ${keyOf(position)}`);
  }
  const state: Record<string, DeckPosition> = { ...positions };
  let pending = Object.keys(targets).filter((aircraftId) => !same(state[aircraftId], targets[aircraftId]));
  const tows: RespotTow[] = [];
  const clearBefore = (position: DeckPosition): readonly string[] =>
    position.kind === 'spot' ? (layout.spots.find((spot) => spot.id === position.id)?.clearBefore ?? []) : [];
  const canGo = (aircraftId: string, to: DeckPosition) => {
    const blockers = towBlockers(layout, state, aircraftId, to);
    return blockers.occupiedBy === null && blockers.mustMove.length === 0 && !blockers.noRoute;
  };
  // Parking on `to` would shut in another pending aircraft: it still has to leave, or enter, a spot behind it.
  const shutsIn = (aircraftId: string, to: DeckPosition) =>
    to.kind === 'spot' &&
    pending.some(
      (other) =>
        other !== aircraftId &&
        (clearBefore(state[other]).includes(to.id) || clearBefore(targets[other]).includes(to.id)),
    );
  const tow = (aircraftId: string, to: DeckPosition) => {
    tows.push({ aircraftId, from: state[aircraftId], to });
    state[aircraftId] = to;
  };
  // Spots and elevators someone ends on; a hangar bay takes any number, so it is never only theirs.
  const wanted = new Set(
    [...Object.values(targets), ...Object.values(reserved)].filter((position) => position.kind !== 'hangar').map(keyOf),
  );
  const holdingPlaces: DeckPosition[] = [
    ...layout.spots.map((spot): DeckPosition => ({ kind: 'spot', id: spot.id })),
    ...layout.hangarBays.map((bay): DeckPosition => ({ kind: 'hangar', id: bay.id })),
  ].filter((position) => !wanted.has(keyOf(position)));

  // Every aircraft moves at most to a holding place and then to its target, so this bounds the turns.
  for (let turn = 0; pending.length > 0 && turn <= 2 * Object.keys(targets).length; turn += 1) {
    const ready = pending.filter((aircraftId) => canGo(aircraftId, targets[aircraftId]));
    const next = ready.find((aircraftId) => !shutsIn(aircraftId, targets[aircraftId])) ?? ready[0];
    if (next !== undefined) {
      tow(next, targets[next]);
      pending = pending.filter((aircraftId) => aircraftId !== next);
      continue;
    }
    const aside = pending
      .filter((aircraftId) => wanted.has(keyOf(state[aircraftId])))
      .flatMap((aircraftId) => {
        const place = holdingPlaces.find((position) => canGo(aircraftId, position) && !shutsIn(aircraftId, position));
        return place === undefined ? [] : [{ aircraftId, place }];
      })[0];
    if (aside === undefined) break;
    tow(aside.aircraftId, aside.place);
  }
  const stuck = pending.map((aircraftId) => {
    const blockers = towBlockers(layout, state, aircraftId, targets[aircraftId]);
    return {
      aircraftId,
      mustMove: [...(blockers.occupiedBy === null ? [] : [blockers.occupiedBy]), ...blockers.mustMove],
    };
  });
  return { tows, stuck };
}
