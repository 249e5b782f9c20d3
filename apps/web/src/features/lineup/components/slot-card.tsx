import type { ReactNode } from 'react';
import { Badge, Box, Flex, HStack, Text } from '@chakra-ui/react';
import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import type { SlotView } from '@catline/contracts';
import { MarginGo } from '../../../components/go-badge.js';
import { GripIcon } from '../../../components/icons.js';
import { SLOT_STATUS_LABELS, SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { formatOptionalClock, formatPounds } from '../../../lib/format.js';
import { slotItemId } from '../hooks/use-lineup-drag.js';

/** The card's frame: its edge says launched, no-go or waiting; a lifted card floats above the board. */
function SlotCardFrame({ slot, lifted, children }: { slot: SlotView; lifted: boolean; children: ReactNode }) {
  const figures = slot.figures;
  return (
    <Flex
      align="flex-start"
      bg={lifted ? 'bg.emphasized' : 'bg.panel'}
      borderWidth="1px"
      borderColor={figures && !figures.go && slot.status !== 'launched' ? 'nogo.border' : 'border'}
      borderLeftWidth="4px"
      borderLeftColor={slot.status === 'launched' ? 'go.solid' : figures && !figures.go ? 'nogo.solid' : 'accent.solid'}
      rounded="card"
      boxShadow={lifted ? 'lg' : undefined}
      opacity={slot.status === 'launched' ? 0.75 : 1}
    >
      {children}
    </Flex>
  );
}

/** What a slot card shows: who, what, how heavy, when, and whether the figures are go. */
function SlotCardContent({ slot, movable }: { slot: SlotView; movable: boolean }) {
  const figures = slot.figures;
  return (
    <Box px="2.5" py="1.5" minW="0" flex="1">
      <Flex justify="space-between" align="center" gap="2">
        <HStack gap="1.5" minW="0">
          {movable && (
            <Box as="span" color="fg.subtle" fontSize="sm" flexShrink={0}>
              <GripIcon />
            </Box>
          )}
          <Text fontWeight="700" fontSize="2xl" lineHeight="1.1" textStyle="figure" data-testid="side-number">
            {slot.sideNumber}
          </Text>
          <Text fontSize="xs" color="fg.muted" truncate>
            {slot.typeDesignation} · {slot.squadronCode}
          </Text>
        </HStack>
        <SlotStatusBadge status={slot.status} />
      </Flex>
      <Text fontSize="sm" color="fg.muted" truncate>
        {slot.pilotName ?? 'No pilot assigned'}
        {slot.mission ? ` · ${slot.mission}` : ''}
      </Text>
      <HStack gap="1.5" wrap="wrap" fontSize="sm" mt="0.5">
        <Text textStyle="figure">{formatPounds(slot.grossWeightLb)}</Text>
        {slot.trimDeg !== null && <Text color="fg.muted">Trim {slot.trimDeg}°</Text>}
        {slot.afterburnerRequired && (
          <Badge size="sm" colorPalette="caution" variant="subtle">
            AB
          </Badge>
        )}
        {slot.tanker && (
          <Badge size="sm" variant="outline">
            Tanker
          </Badge>
        )}
        {slot.earlyWarning && (
          <Badge size="sm" variant="outline">
            Early warning
          </Badge>
        )}
        {slot.spare && (
          <Badge size="sm" variant="outline">
            Spare
          </Badge>
        )}
      </HStack>
      {figures && (
        <Flex justify="space-between" align="center" gap="2" mt="1" fontSize="sm" wrap="wrap">
          <Text textStyle="figure" title="Projected launch time">
            {slot.launchedAt
              ? `Off ${formatOptionalClock(slot.launchedAt)}`
              : formatOptionalClock(slot.projectedLaunchAt)}
            {slot.missesWindow && !slot.launchedAt && (
              <Text as="span" color="nogo.fg" fontWeight="700">
                {' '}
                late
              </Text>
            )}
          </Text>
          <MarginGo figures={figures} />
        </Flex>
      )}
    </Box>
  );
}

/** A card as it floats under the pointer while it is being dragged. */
export function LiftedSlotCard({ slot }: { slot: SlotView }) {
  return (
    <SlotCardFrame slot={slot} lifted>
      <SlotCardContent slot={slot} movable />
    </SlotCardFrame>
  );
}

interface SortableSlotCardProps {
  slot: SlotView;
  /** Cards a person may not move stay put (wrong role, or the aircraft has gone). */
  movable: boolean;
  /** The card's menu: it sits beside the draggable area, so its keys and taps never start a drag. */
  menu?: ReactNode;
}

export function SortableSlotCard({ slot, movable, menu }: SortableSlotCardProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: slotItemId(slot.id),
    disabled: !movable,
  });
  return (
    <Box
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      opacity={isDragging ? 0.35 : 1}
      data-testid="slot-card"
      data-side-number={slot.sideNumber}
      data-status={slot.status}
    >
      <SlotCardFrame slot={slot} lifted={false}>
        <Box
          ref={setActivatorNodeRef}
          {...(movable ? { ...attributes, ...listeners } : {})}
          aria-label={
            movable ? `${slot.sideNumber}, ${slot.typeDesignation}, ${SLOT_STATUS_LABELS[slot.status]}` : undefined
          }
          flex="1"
          minW="0"
          display="flex"
          cursor={movable ? 'grab' : 'default'}
          touchAction={movable ? 'manipulation' : undefined}
          rounded="card"
          _focusVisible={{ outline: '3px solid', outlineColor: 'accent.focusRing', outlineOffset: '2px' }}
        >
          <SlotCardContent slot={slot} movable={movable} />
        </Box>
        {menu}
      </SlotCardFrame>
    </Box>
  );
}
