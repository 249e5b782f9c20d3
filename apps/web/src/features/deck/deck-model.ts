import type { DeckPositionView, LineupSnapshot, ShipView, SlotView } from '@catline/contracts';

export interface DeckPlace {
  position: DeckPositionView;
  /** The aircraft on it, by side number order. */
  slots: SlotView[];
}

export interface DeckPanel {
  /** The deck area's name, or "Elevators" / "Hangar". */
  title: string;
  places: DeckPlace[];
}

const key = (position: DeckPositionView) => `${position.kind}:${position.name}`;

/**
 * The ship's positions grouped as the deck screen draws them: one panel per named deck area (spots in
 * the order the ship lists them), then the elevators, then the hangar bays; each with the cycle's
 * aircraft on it. Aircraft that have launched are on no position.
 */
export function deckPanels(ship: ShipView, snapshot: LineupSnapshot): DeckPanel[] {
  const onPlace = new Map<string, SlotView[]>();
  for (const slot of snapshot.slots) {
    if (slot.deckPosition === null) continue;
    const list = onPlace.get(key(slot.deckPosition)) ?? [];
    list.push(slot);
    onPlace.set(key(slot.deckPosition), list);
  }
  const place = (position: DeckPositionView): DeckPlace => ({ position, slots: onPlace.get(key(position)) ?? [] });
  const areas: DeckPanel[] = [];
  for (const spot of ship.deckSpots) {
    const title = spot.area ?? spot.name;
    let panel = areas.find((candidate) => candidate.title === title);
    if (!panel) {
      panel = { title, places: [] };
      areas.push(panel);
    }
    panel.places.push(place({ kind: 'spot', name: spot.name }));
  }
  const elevators = ship.deckLayout.elevators.map((elevator) => place({ kind: 'elevator', name: elevator.name }));
  const bays = ship.deckLayout.hangarBays.map((bay) => place({ kind: 'hangar', name: bay.name }));
  return [
    ...areas,
    ...(elevators.length > 0 ? [{ title: 'Elevators', places: elevators }] : []),
    ...(bays.length > 0 ? [{ title: 'Hangar', places: bays }] : []),
  ];
}

/** Where an aircraft may be towed to from the menu: every free spot or elevator, and every hangar bay. */
export function towTargets(panels: readonly DeckPanel[], slot: SlotView): DeckPositionView[] {
  return panels
    .flatMap((panel) => panel.places)
    .filter(
      (candidate) =>
        (candidate.position.kind === 'hangar' || candidate.slots.length === 0) && isElsewhere(candidate, slot),
    )
    .map((candidate) => candidate.position);
}

export const positionLabel = (position: DeckPositionView) =>
  position.kind === 'spot'
    ? position.name
    : position.kind === 'elevator'
      ? `Elevator ${position.name}`
      : `Hangar ${position.name}`;

export const positionKey = key;

/** The position a place's key names (the inverse of {@link positionKey}). */
export function positionFromKey(placeKey: string): DeckPositionView {
  const [kind, ...name] = placeKey.split(':');
  return { kind: kind as DeckPositionView['kind'], name: name.join(':') };
}

/** Whether the aircraft is somewhere other than the place (a drop where it already is asks for nothing). */
export function isElsewhere(place: DeckPlace, slot: SlotView): boolean {
  return slot.deckPosition === null || key(place.position) !== key(slot.deckPosition);
}

export interface RespotStep {
  /** 1-based, the order the deck crew tows in. */
  step: number;
  sideNumber: string;
  from: DeckPositionView;
  to: DeckPositionView;
  doneAt: string | null;
  /** The first tow not yet done: the only one the deck crew can tick off. */
  next: boolean;
}

/** The respot's tows in order, each with its aircraft's side number. */
export function respotSteps(snapshot: LineupSnapshot): RespotStep[] {
  const tows = snapshot.cycle.respot?.tows ?? [];
  const next = tows.findIndex((tow) => tow.doneAt === null);
  const sides = new Map(snapshot.slots.map((slot) => [slot.id, slot.sideNumber]));
  return tows.map((tow, index) => ({
    step: index + 1,
    sideNumber: sides.get(tow.slotId) ?? `slot ${tow.slotId}`,
    from: tow.from,
    to: tow.to,
    doneAt: tow.doneAt,
    next: index === next,
  }));
}

/**
 * The aircraft a respot can place, by side number: those on deck or below (where they are now) and
 * those launched, airborne until the recovery (now: null).
 */
export function respotCandidates(snapshot: LineupSnapshot): { slot: SlotView; now: DeckPositionView | null }[] {
  return snapshot.slots
    .filter((slot) => ['launched', 'planned', 'down', 'scratched'].includes(slot.status))
    .sort((a, b) => a.sideNumber.localeCompare(b.sideNumber))
    .map((slot) => ({ slot, now: slot.status === 'launched' ? null : slot.deckPosition }));
}
