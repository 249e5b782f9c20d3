import { useMemo, useRef, useState } from 'react';
import {
  closestCenter,
  closestCorners,
  KeyboardSensor,
  MouseSensor,
  pointerWithin,
  TouchSensor,
  useSensor,
  useSensors,
  type Announcements,
  type CollisionDetection,
  type DragEndEvent,
  type DragOverEvent,
  type DragStartEvent,
  type UniqueIdentifier,
} from '@dnd-kit/core';
import { arrayMove, sortableKeyboardCoordinates } from '@dnd-kit/sortable';
import type { LineupSnapshot, MoveSlotRequest } from '@catline/contracts';
import { catapultOf, type ContainerId, type Containers, containersOf, placeName, slotsById } from '../lineup-model.js';

export const slotItemId = (slotId: number) => `slot:${slotId}`;
const slotIdOf = (id: UniqueIdentifier) => Number(String(id).slice('slot:'.length));
const isContainerId = (id: UniqueIdentifier): id is ContainerId => id === 'pool' || String(id).startsWith('lane:');

function containerOf(id: UniqueIdentifier, containers: Containers): ContainerId | undefined {
  if (isContainerId(id)) return id;
  const slotId = slotIdOf(id);
  return (Object.keys(containers) as ContainerId[]).find((container) => containers[container].includes(slotId));
}

const instructions =
  'To move an aircraft, focus its card and press Enter to pick it up. The arrow keys move it along a lane or across to the deck pool or another catapult. Enter puts it down there; Escape leaves it where it was.';

/**
 * Drag and drop on the lineup board with mouse, touch or keyboard. While a card is held the board works
 * on a draft; on drop, one move request goes to the server with the lane order as it was before.
 */
export function useLineupDrag(snapshot: LineupSnapshot, onMove: (request: MoveSlotRequest) => void) {
  const [draft, setDraft] = useState<Containers | null>(null);
  const [activeSlotId, setActiveSlotId] = useState<number | null>(null);
  // A dropped card stays where it was put until the lineup itself changes (the move's optimistic view
  // arrives a render or more later): the board never shows it back in its old place meanwhile, where a
  // drag started at once would find the wrong card or none.
  const [landed, setLanded] = useState<{ board: Containers; basis: LineupSnapshot } | null>(null);
  // Once the lineup has changed, it alone says where the card is: a refused move's rollback puts back the
  // lineup the card was dropped on, which must not pass for "not changed yet" and keep the refused place.
  if (landed && landed.basis !== snapshot) setLanded(null);
  const containers = useMemo(
    () => draft ?? (landed?.basis === snapshot ? landed.board : containersOf(snapshot)),
    [draft, landed, snapshot],
  );
  // DndContext always calls the handlers of the latest render, so they may read this render's values.

  const sensors = useSensors(
    useSensor(MouseSensor, { activationConstraint: { distance: 6 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 180, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

  // Pointer: the card under it; over a lane's empty space, the nearest card in that lane, else the lane.
  // Keyboard: whatever the arrow key moved the card closest to.
  const collisionDetection: CollisionDetection = (args) => {
    const hits = args.pointerCoordinates ? pointerWithin(args) : closestCorners(args).slice(0, 1);
    const card = hits.find((hit) => !isContainerId(hit.id));
    if (card) return [card];
    const container = hits[0]?.id;
    if (container === undefined || !isContainerId(container))
      return args.pointerCoordinates ? closestCorners(args).slice(0, 1) : [];
    const inside = containers[container] ?? [];
    const nearest = closestCenter({
      ...args,
      droppableContainers: args.droppableContainers.filter(
        (candidate) => !isContainerId(candidate.id) && inside.includes(slotIdOf(candidate.id)),
      ),
    });
    return nearest.length > 0 ? nearest.slice(0, 1) : hits;
  };

  const sideOf = (id: UniqueIdentifier) => slotsById(snapshot).get(slotIdOf(id))?.sideNumber ?? 'The aircraft';

  const describePlace = (id: UniqueIdentifier) => {
    const container = containerOf(id, containers);
    if (!container) return 'nowhere on the board';
    const index = isContainerId(id) || container === 'pool' ? undefined : containers[container].indexOf(slotIdOf(id));
    return placeName(snapshot, container, index);
  };

  // Where the held card started, so hovering over its own place does not talk over "Picked up".
  const startPlace = useRef('');

  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${sideOf(active.id)} from ${describePlace(active.id)}.`,
    onDragOver: ({ active, over }) => {
      if (!over) return `${sideOf(active.id)} is not over a lane.`;
      const place = describePlace(over.id);
      return place === startPlace.current ? undefined : `${sideOf(active.id)} is over ${place}.`;
    },
    onDragEnd: ({ active, over }) =>
      over
        ? `${sideOf(active.id)} put down in ${describePlace(active.id)}.`
        : `${sideOf(active.id)} put back where it was.`,
    onDragCancel: ({ active }) => `Move cancelled. ${sideOf(active.id)} stays where it was.`,
  };

  const finish = () => {
    setDraft(null);
    setActiveSlotId(null);
  };

  const onDragStart = ({ active }: DragStartEvent) => {
    startPlace.current = describePlace(active.id);
    setActiveSlotId(slotIdOf(active.id));
    setDraft(containers);
  };

  const onDragOver = ({ active, over }: DragOverEvent) => {
    if (!over) return;
    setDraft((current) => {
      const board = current ?? containers;
      const from = containerOf(active.id, board);
      const to = containerOf(over.id, board);
      if (!from || !to || from === to) return current;
      const slotId = slotIdOf(active.id);
      const target = [...board[to]];
      const overIndex = isContainerId(over.id) ? -1 : target.indexOf(slotIdOf(over.id));
      const held = active.rect.current.translated;
      const below = held !== null && overIndex >= 0 && held.top > over.rect.top + over.rect.height / 2;
      const index = overIndex >= 0 ? overIndex + (below ? 1 : 0) : target.length;
      target.splice(index, 0, slotId);
      return { ...board, [from]: board[from].filter((id) => id !== slotId), [to]: target };
    });
  };

  const onDragEnd = ({ active, over }: DragEndEvent) => {
    const board = containers;
    const before = containersOf(snapshot);
    finish();
    if (!over) return;
    const slotId = slotIdOf(active.id);
    const container = containerOf(active.id, board);
    if (!container) return;
    let order = board[container];
    if (!isContainerId(over.id) && containerOf(over.id, board) === container) {
      order = arrayMove(order, order.indexOf(slotId), order.indexOf(slotIdOf(over.id)));
    }
    const toIndex = order.indexOf(slotId);
    const from = containerOf(active.id, before);
    // The pool keeps its own order (by side number): a shuffle inside it changes nothing.
    if (from === container && (container === 'pool' || before[container].indexOf(slotId) === toIndex)) return;
    const slot = slotsById(snapshot).get(slotId);
    if (!slot) return;
    setLanded({ board: { ...board, [container]: order }, basis: snapshot });
    onMove({
      slotId,
      slotVersion: slot.version,
      toCatapultId: catapultOf(container),
      toIndex,
      targetLaneOrder: before[container] ?? [],
    });
  };

  return {
    containers,
    activeSlotId,
    contextProps: {
      sensors,
      collisionDetection,
      onDragStart,
      onDragOver,
      onDragEnd,
      onDragCancel: finish,
      accessibility: { announcements, screenReaderInstructions: { draggable: instructions } },
    },
  };
}
