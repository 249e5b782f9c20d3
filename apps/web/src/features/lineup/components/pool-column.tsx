import type { ReactNode } from 'react';
import { Box, Grid, Stack, Text } from '@chakra-ui/react';
import { useDroppable } from '@dnd-kit/core';
import { rectSortingStrategy, SortableContext } from '@dnd-kit/sortable';
import { slotItemId } from '../hooks/use-lineup-drag.js';

/** Aircraft of the cycle not yet in a lane; they leave it by being dragged onto a catapult. */
export function PoolColumn({
  slotIds,
  children,
  downList,
}: {
  slotIds: number[];
  children: ReactNode;
  downList: ReactNode;
}) {
  const { setNodeRef, isOver } = useDroppable({ id: 'pool' });
  return (
    <Stack
      as="section"
      aria-label="Deck pool"
      data-testid="deck-pool"
      gap="2"
      minW="0"
      bg="bg.muted"
      borderWidth="1px"
      rounded="card"
      p="2"
    >
      <Text as="h2" fontWeight="700" fontSize="lg" px="1">
        Deck pool{' '}
        <Text as="span" color="fg.muted" fontWeight="500">
          ({slotIds.length})
        </Text>
      </Text>
      <SortableContext id="pool" items={slotIds.map(slotItemId)} strategy={rectSortingStrategy}>
        <Grid
          ref={setNodeRef}
          gap="2"
          p="1"
          minH="5rem"
          rounded="card"
          templateColumns={{ base: '1fr', sm: 'repeat(auto-fill, minmax(13rem, 1fr))', xl: '1fr' }}
          outline={isOver ? '2px dashed' : undefined}
          outlineColor="accent.focusRing"
        >
          {children}
          {slotIds.length === 0 && (
            <Box textAlign="center" color="fg.subtle" fontSize="sm" py="4">
              Every aircraft has a catapult.
            </Box>
          )}
        </Grid>
      </SortableContext>
      {downList}
    </Stack>
  );
}
