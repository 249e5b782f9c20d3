import type { ReactNode } from 'react';
import { Badge, Box, Flex, HStack, Stack, Text } from '@chakra-ui/react';
import { useDroppable } from '@dnd-kit/core';
import { SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';
import type { LaneView } from '@catline/contracts';
import { GoBadge } from '../../../components/go-badge.js';
import { WindIcon } from '../../../components/icons.js';
import { formatKnots } from '../../../lib/format.js';
import { slotItemId } from '../hooks/use-lineup-drag.js';
import { DeckStatusLine } from '../../../components/deck-status-line.js';
import { laneContainer, type LaneCounts } from '../lineup-model.js';

interface LaneColumnProps {
  lane: LaneView;
  slotIds: number[];
  counts: LaneCounts;
  /** The catapult's own menu (mark it down or up), for the handler. */
  menu?: ReactNode;
  children: ReactNode;
}

function windWords(lane: LaneView) {
  const cross =
    lane.crosswindSide === 'none' ? 'no crosswind' : `${formatKnots(lane.crosswindKt)} from ${lane.crosswindSide}`;
  return `${formatKnots(lane.headwindKt)} headwind, ${cross}`;
}

/** One figure of a lane's head; a late or down aircraft stands out once there is one. */
function LaneCount({ count, label, alarm = false }: { count: number; label: string; alarm?: boolean }) {
  const raised = alarm && count > 0;
  return (
    <Text as="span" color={raised ? 'nogo.fg' : undefined} fontWeight={raised ? '700' : undefined}>
      <Text as="span" textStyle="figure" color={raised ? undefined : 'fg'}>
        {count}
      </Text>{' '}
      {label}
    </Text>
  );
}

/** One catapult's queue: its state and wind over deck on top, its slots in launch order below. */
export function LaneColumn({ lane, slotIds, counts, menu, children }: LaneColumnProps) {
  const { setNodeRef, isOver } = useDroppable({ id: laneContainer(lane.catapultId) });
  const unavailable = lane.status === 'down' || lane.closed;
  return (
    <Stack
      as="section"
      aria-label={`Catapult ${lane.number} lane`}
      data-testid="lane"
      data-catapult-number={lane.number}
      gap="1"
      minW="0"
      bg="bg.subtle"
      borderWidth="1px"
      borderColor={unavailable ? 'nogo.border' : 'border'}
      rounded="card"
      p="1"
    >
      <Stack gap="0" ps="1">
        <Flex justify="space-between" align="center" gap="1.5" minH="tap">
          <HStack gap="1.5" minW="0">
            <Text as="h2" fontWeight="700" fontSize="lg" whiteSpace="nowrap">
              Cat {lane.number}
            </Text>
            <Text fontSize="sm" color="fg.muted" textTransform="capitalize" truncate>
              {lane.position}
            </Text>
          </HStack>
          <HStack gap="1" flexShrink={0}>
            {lane.status === 'down' ? (
              <Badge colorPalette="nogo" variant="solid" data-testid="catapult-status">
                DOWN
              </Badge>
            ) : lane.closed ? (
              <Badge colorPalette="caution" variant="solid" data-testid="catapult-status">
                CLOSED
              </Badge>
            ) : (
              <Badge colorPalette="go" variant="outline" data-testid="catapult-status">
                UP
              </Badge>
            )}
            <GoBadge verdict={lane.go ? 'go' : 'nogo'} />
            {menu}
          </HStack>
        </Flex>
        <DeckStatusLine lane={lane} />
        <HStack gap="1.5" fontSize="xs" color="fg.muted" title="Wind over deck on this catapult" minW="0">
          <WindIcon />
          <Text truncate>{windWords(lane)}</Text>
        </HStack>
        <Text fontSize="xs" color="fg.muted" data-testid="lane-counts">
          <LaneCount count={counts.launched} label="off" /> · <LaneCount count={counts.toGo} label="to go" /> ·{' '}
          <LaneCount count={counts.late} label="late" alarm /> · <LaneCount count={counts.down} label="down" alarm />
        </Text>
      </Stack>
      <SortableContext
        id={laneContainer(lane.catapultId)}
        items={slotIds.map(slotItemId)}
        strategy={verticalListSortingStrategy}
      >
        <Stack
          ref={setNodeRef}
          gap="1.5"
          minH="6rem"
          p="0.5"
          rounded="card"
          outline={isOver ? '2px dashed' : undefined}
          outlineColor="accent.focusRing"
          data-testid="lane-drop-zone"
        >
          {children}
          {slotIds.length === 0 && (
            <Box
              textAlign="center"
              color="fg.muted"
              fontSize="sm"
              py="6"
              borderWidth="1px"
              borderStyle="dashed"
              rounded="card"
            >
              No aircraft yet
            </Box>
          )}
        </Stack>
      </SortableContext>
    </Stack>
  );
}
