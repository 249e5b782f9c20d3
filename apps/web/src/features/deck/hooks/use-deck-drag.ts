import { useState } from 'react';
import {
  KeyboardCode,
  KeyboardSensor,
  MouseSensor,
  pointerWithin,
  TouchSensor,
  useSensor,
  useSensors,
  type Announcements,
  type CollisionDetection,
  type DragEndEvent,
  type DragStartEvent,
  type KeyboardCoordinateGetter,
  type UniqueIdentifier,
} from '@dnd-kit/core';
import type { SlotView } from '@catline/contracts';
import { isElsewhere, positionKey, positionLabel, type DeckPanel, type DeckPlace } from '../deck-model.js';

export const chipItemId = (slotId: number) => `chip:${slotId}`;
export const placeItemId = (place: DeckPlace) => `place:${positionKey(place.position)}`;
const slotIdOf = (id: UniqueIdentifier) => Number(String(id).slice('chip:'.length));

const instructions =
  'To tow an aircraft, focus its chip and press Enter to pick it up. The arrow keys move it from place to place on the deck, the elevators and the hangar. Enter puts it down there; Escape leaves it where it was.';

const STEPS: Record<string, (from: DOMRect, to: { left: number; top: number }) => boolean> = {
  [KeyboardCode.Down]: (from, to) => to.top > from.top + 1,
  [KeyboardCode.Up]: (from, to) => to.top < from.top - 1,
  [KeyboardCode.Right]: (from, to) => to.left > from.left + 1,
  [KeyboardCode.Left]: (from, to) => to.left < from.left - 1,
};

/**
 * The keyboard steps from place to place: an arrow key puts the held chip's corner just inside the
 * nearest place in that direction (the places are rows of different sizes, so the nearest corner wins).
 */
const placeKeyboardCoordinates: KeyboardCoordinateGetter = (event, { context }) => {
  const step = STEPS[event.code];
  if (!step) return undefined;
  event.preventDefault();
  const { collisionRect, droppableRects, droppableContainers } = context;
  if (!collisionRect) return undefined;
  const from = new DOMRect(collisionRect.left, collisionRect.top, collisionRect.width, collisionRect.height);
  let best: { left: number; top: number; distance: number } | null = null;
  for (const container of droppableContainers.getEnabled()) {
    const rect = droppableRects.get(container.id);
    if (!rect || !step(from, rect)) continue;
    const distance = Math.hypot(rect.left - from.left, rect.top - from.top);
    if (!best || distance < best.distance) best = { left: rect.left, top: rect.top, distance };
  }
  return best ? { x: best.left + 2, y: best.top + 2 } : undefined;
};

/** Pointer: the place under it. Keyboard: the place holding the chip's top-left corner. */
const collisionDetection: CollisionDetection = (args) => {
  if (args.pointerCoordinates) return pointerWithin(args);
  const { left, top } = args.collisionRect;
  const hit = args.droppableContainers.find((candidate) => {
    const rect = args.droppableRects.get(candidate.id);
    return rect !== undefined && left >= rect.left && left < rect.right && top >= rect.top && top < rect.bottom;
  });
  return hit ? [{ id: hit.id }] : [];
};

/**
 * Towing by drag on the deck screen with mouse, touch or keyboard: a chip is picked up from its place and
 * put down on another; the drop asks the server for one tow, whose refusal (occupied, blocked) names the
 * aircraft in the way.
 */
export function useDeckDrag(panels: readonly DeckPanel[], onTow: (slot: SlotView, placeKey: string) => void) {
  const [heldSlotId, setHeldSlotId] = useState<number | null>(null);
  const places = panels.flatMap((panel) => panel.places);
  const slotOf = (id: UniqueIdentifier) =>
    places.flatMap((place) => place.slots).find((slot) => slot.id === slotIdOf(id));
  const placeOf = (id: UniqueIdentifier) => places.find((place) => placeItemId(place) === id);
  const sideOf = (id: UniqueIdentifier) => slotOf(id)?.sideNumber ?? 'The aircraft';
  const placeWords = (id: UniqueIdentifier) => {
    const place = placeOf(id);
    return place ? positionLabel(place.position) : 'no place';
  };
  const fromWords = (id: UniqueIdentifier) => {
    const position = slotOf(id)?.deckPosition;
    return position ? positionLabel(position) : 'no place';
  };

  const sensors = useSensors(
    useSensor(MouseSensor, { activationConstraint: { distance: 6 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 180, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: placeKeyboardCoordinates }),
  );

  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${sideOf(active.id)} from ${fromWords(active.id)}.`,
    onDragOver: ({ active, over }) =>
      over ? `${sideOf(active.id)} is over ${placeWords(over.id)}.` : `${sideOf(active.id)} is over no place.`,
    onDragEnd: ({ active, over }) =>
      over ? `${sideOf(active.id)} put down on ${placeWords(over.id)}.` : `${sideOf(active.id)} stays where it was.`,
    onDragCancel: ({ active }) => `Tow cancelled. ${sideOf(active.id)} stays where it was.`,
  };

  const onDragStart = ({ active }: DragStartEvent) => setHeldSlotId(slotIdOf(active.id));
  const onDragEnd = ({ active, over }: DragEndEvent) => {
    setHeldSlotId(null);
    const slot = slotOf(active.id);
    const place = over ? placeOf(over.id) : undefined;
    if (slot && place && isElsewhere(place, slot)) onTow(slot, positionKey(place.position));
  };

  return {
    held: heldSlotId === null ? undefined : slotOf(chipItemId(heldSlotId)),
    contextProps: {
      sensors,
      collisionDetection,
      onDragStart,
      onDragEnd,
      onDragCancel: () => setHeldSlotId(null),
      accessibility: { announcements, screenReaderInstructions: { draggable: instructions } },
    },
  };
}
