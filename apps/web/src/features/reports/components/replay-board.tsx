import { Badge, Box, Flex, HStack, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { LaneView, LineupSnapshot, SlotView } from '@catline/contracts';
import { MarginGo } from '../../../components/go-badge.js';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { outOfLineup } from '../replay-model.js';

/** One aircraft as the lineup held it at the step; the ones the step changed are marked. */
function ReplaySlot({ slot, changed }: { slot: SlotView; changed: boolean }) {
  const { optionalClock } = useShipClock();
  const figures = slot.figures;
  return (
    <Box
      data-testid="replay-slot"
      data-side-number={slot.sideNumber}
      data-changed={changed ? '' : undefined}
      bg={changed ? 'accent.subtle' : 'bg.panel'}
      borderWidth={changed ? '2px' : '1px'}
      borderColor={changed ? 'accent.solid' : 'border'}
      rounded="card"
      px="2"
      py="1.5"
    >
      <Flex justify="space-between" align="center" gap="2">
        <HStack gap="1.5" minW="0">
          <Text fontWeight="700" textStyle="figure">
            {slot.sideNumber}
          </Text>
          <Text fontSize="xs" color="fg.muted" truncate>
            {slot.typeDesignation} · {slot.squadronCode}
          </Text>
        </HStack>
        <SlotStatusBadge status={slot.status} />
      </Flex>
      <Flex justify="space-between" align="center" gap="2" fontSize="sm" mt="0.5" wrap="wrap">
        <Text textStyle="figure" color="fg.muted">
          {slot.launchedAt ? `Off ${optionalClock(slot.launchedAt)}` : `Proj. ${optionalClock(slot.projectedLaunchAt)}`}
        </Text>
        {figures && <MarginGo slot={{ ...slot, figures }} />}
      </Flex>
    </Box>
  );
}

function ReplayLane({ lane, slots, changed }: { lane: LaneView; slots: Map<number, SlotView>; changed: Set<number> }) {
  return (
    <Stack
      as="section"
      aria-label={`Cat ${lane.number} at this step`}
      data-testid="replay-lane"
      gap="1.5"
      bg="bg.subtle"
      borderWidth="1px"
      rounded="card"
      p="2"
      minW="0"
    >
      <HStack justify="space-between">
        <Text fontWeight="700">
          Cat {lane.number}{' '}
          <Text as="span" fontSize="sm" color="fg.muted" fontWeight="400" textTransform="capitalize">
            {lane.position}
          </Text>
        </Text>
        {lane.status === 'down' ? (
          <Badge colorPalette="nogo" variant="solid">
            DOWN
          </Badge>
        ) : lane.closed ? (
          <Badge colorPalette="caution" variant="solid">
            CLOSED
          </Badge>
        ) : null}
      </HStack>
      {lane.slotIds.length === 0 ? (
        <Text fontSize="sm" color="fg.muted">
          Empty
        </Text>
      ) : (
        lane.slotIds.map((id) => <ReplaySlot key={id} slot={slots.get(id)!} changed={changed.has(id)} />)
      )}
    </Stack>
  );
}

/** The lineup as it stood at one step of the replay: the lanes, the deck pool, and who is out of it. */
export function ReplayBoard({ snapshot, changed }: { snapshot: LineupSnapshot; changed: Set<number> }) {
  const slots = new Map(snapshot.slots.map((slot) => [slot.id, slot]));
  const out = outOfLineup(snapshot);
  return (
    <Stack gap="3" minW="0">
      <SimpleGrid columns={{ base: 1, sm: 2, '2xl': 4 }} gap="2">
        {snapshot.lanes.map((lane) => (
          <ReplayLane key={lane.catapultId} lane={lane} slots={slots} changed={changed} />
        ))}
      </SimpleGrid>
      <Stack
        as="section"
        aria-label="Deck pool at this step"
        gap="1.5"
        borderWidth="1px"
        borderStyle="dashed"
        rounded="card"
        p="2"
      >
        <Text fontWeight="700">Deck pool</Text>
        {snapshot.pool.length === 0 ? (
          <Text fontSize="sm" color="fg.muted">
            Empty
          </Text>
        ) : (
          <SimpleGrid columns={{ base: 1, sm: 2, '2xl': 4 }} gap="1.5">
            {snapshot.pool.map((id) => (
              <ReplaySlot key={id} slot={slots.get(id)!} changed={changed.has(id)} />
            ))}
          </SimpleGrid>
        )}
        {out.length > 0 && (
          <Text fontSize="sm" color="fg.muted" data-testid="replay-out">
            Out of the lineup: {out.map((slot) => `${slot.sideNumber} (${slot.status})`).join(', ')}
          </Text>
        )}
      </Stack>
    </Stack>
  );
}
