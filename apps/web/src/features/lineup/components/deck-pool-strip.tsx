import type { ReactNode } from 'react';
import { Box, Button, Flex, Stack, Text } from '@chakra-ui/react';
import { useDroppable } from '@dnd-kit/core';
import { useFiguresLive } from '../../../components/live-figures.js';
import { horizontalListSortingStrategy, SortableContext } from '@dnd-kit/sortable';
import { slotItemId } from '../hooks/use-lineup-drag.js';

/**
 * Aircraft of the cycle not yet in a lane, as one strip above the catapults so the lanes start near the
 * top; it folds away when the handler no longer drags from it. The whole strip takes a card dropped back.
 */
export function DeckPoolStrip({
  slotIds,
  children,
  downList,
  open,
  onToggle,
  action,
}: {
  slotIds: number[];
  children: ReactNode;
  downList: ReactNode;
  /** Whether its cards are shown: the board lays out the band around the strip by it. */
  open: boolean;
  onToggle: () => void;
  action: ReactNode;
}) {
  const { setNodeRef, isOver } = useDroppable({ id: 'pool' });
  // Not live, the cards' controls are disabled with their fieldset, where axe counts a scroll box as out of the
  // keyboard's reach: the cards wrap instead, every one in sight.
  const scrolls = useFiguresLive();
  return (
    <Flex
      as="section"
      aria-label="Deck pool"
      data-testid="deck-pool"
      data-open={String(open)}
      ref={setNodeRef}
      gap="2"
      minW="0"
      bg="bg.muted"
      borderWidth="1px"
      rounded="card"
      p="1"
      align="stretch"
      outline={isOver ? '2px dashed' : undefined}
      outlineColor="accent.focusRing"
    >
      {/* Folded, its controls line up in one row, so the strip gives its height to the catapults. */}
      <Stack
        direction={open ? 'column' : 'row'}
        gap="1"
        flexShrink={0}
        justify="center"
        align={open ? undefined : 'center'}
      >
        <Button
          variant="ghost"
          size="sm"
          minH="tap"
          fontSize="md"
          fontWeight="700"
          aria-expanded={open}
          onClick={onToggle}
          data-testid="deck-pool-toggle"
        >
          {open ? '▾' : '▸'} Deck pool ({slotIds.length})
        </Button>
        {action}
        {downList}
      </Stack>
      {open && (
        <SortableContext id="pool" items={slotIds.map(slotItemId)} strategy={horizontalListSortingStrategy}>
          <Flex
            gap="2"
            flex="1"
            minW="0"
            overflowX={scrolls ? 'auto' : undefined}
            wrap={scrolls ? undefined : 'wrap'}
            align="stretch"
            p="0.5"
            data-testid="deck-pool-cards"
          >
            {children}
            {slotIds.length === 0 && (
              <Box alignSelf="center" color="fg.muted" fontSize="sm" px="2">
                Every aircraft has a catapult.
              </Box>
            )}
          </Flex>
        </SortableContext>
      )}
      {!open && (
        // Where the folded strip shares its row with the figures and the warnings, they need the width.
        <Text alignSelf="center" fontSize="sm" color="fg.muted" truncate textStyle="figure" hideFrom="lg">
          {slotIds.length === 0 ? 'Every aircraft has a catapult.' : 'Open it to drag an aircraft to a catapult.'}
        </Text>
      )}
    </Flex>
  );
}
