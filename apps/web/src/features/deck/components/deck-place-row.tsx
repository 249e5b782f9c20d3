import type { ReactNode } from 'react';
import { Flex, Text } from '@chakra-ui/react';
import { useDroppable } from '@dnd-kit/core';
import { positionKey, type DeckPlace } from '../deck-model.js';
import { placeItemId } from '../hooks/use-deck-drag.js';

/** One position of the deck as a row: its name, then the aircraft on it (or "free"); a chip drops here. */
export function DeckPlaceRow({ place, children }: { place: DeckPlace; children: ReactNode }) {
  const { setNodeRef, isOver } = useDroppable({ id: placeItemId(place) });
  return (
    <Flex
      ref={setNodeRef}
      gap="2"
      align="flex-start"
      minH="tap"
      rounded="md"
      outline={isOver ? '2px dashed' : undefined}
      outlineColor="accent.focusRing"
      data-testid={`place-${positionKey(place.position)}`}
    >
      <Text fontSize="sm" color="fg.muted" minW="5.5rem" pt="1">
        {place.position.name}
      </Text>
      <Flex gap="1" wrap="wrap" flex="1">
        {place.slots.length === 0 ? (
          <Text fontSize="sm" color="fg.muted" pt="1">
            free
          </Text>
        ) : (
          children
        )}
      </Flex>
    </Flex>
  );
}
