import { Box, Text } from '@chakra-ui/react';
import { useDraggable } from '@dnd-kit/core';
import type { SlotView } from '@catline/contracts';
import { GripIcon } from '../../../components/icons.js';
import { SelectInput } from '../../../components/select-field.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { positionKey, positionLabel, type DeckPanel, towTargets } from '../deck-model.js';
import { chipItemId } from '../hooks/use-deck-drag.js';

/** What a chip says: side number, type, projected launch, and the aircraft it waits for. */
function ChipContent({ slot, movable }: { slot: SlotView; movable: boolean }) {
  const { optionalClock } = useShipClock();
  return (
    <Box>
      <Text fontWeight="700" fontSize="lg" lineHeight="1.2">
        {movable && (
          <Box as="span" color="fg.subtle" fontSize="sm" me="1">
            <GripIcon />
          </Box>
        )}
        {slot.sideNumber}
      </Text>
      <Text fontSize="xs" color="fg.muted" data-testid="chip-launch">
        {slot.typeDesignation} · launch {optionalClock(slot.projectedLaunchAt)}
      </Text>
      {slot.mustMove.length > 0 && (
        <Text fontSize="xs" color="fg.warning">
          Waits for {slot.mustMove.join(', ')}
        </Text>
      )}
    </Box>
  );
}

/** A chip as it floats under the finger or pointer while it is being towed. */
export function LiftedChip({ slot }: { slot: SlotView }) {
  return (
    <Box borderWidth="1px" borderColor="border.emphasized" rounded="md" px="2" py="1" bg="bg.emphasized" boxShadow="lg">
      <ChipContent slot={slot} movable />
    </Box>
  );
}

/**
 * One aircraft on its position. The handler tows it by dragging the chip (mouse, touch, keyboard) or
 * from its "move to" menu, which sits outside the draggable part so choosing never starts a drag.
 */
export function PositionChip({
  slot,
  panels,
  onTow,
}: {
  slot: SlotView;
  panels: readonly DeckPanel[];
  onTow: ((slot: SlotView, to: string) => void) | null;
}) {
  const movable = onTow !== null && slot.status === 'planned';
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({
    id: chipItemId(slot.id),
    disabled: !movable,
  });
  return (
    <Box
      borderWidth="1px"
      borderColor="border.emphasized"
      rounded="md"
      px="2"
      py="1"
      opacity={isDragging ? 0.35 : 1}
      data-testid={`chip-${slot.sideNumber}`}
    >
      <Box
        ref={setNodeRef}
        {...(movable ? { ...attributes, ...listeners } : {})}
        cursor={movable ? 'grab' : 'default'}
        touchAction={movable ? 'none' : undefined}
        rounded="md"
        _focusVisible={{ outline: '3px solid', outlineColor: 'accent.focusRing', outlineOffset: '2px' }}
      >
        <ChipContent slot={slot} movable={movable} />
      </Box>
      {movable && (
        <SelectInput
          value=""
          placeholder="Move to…"
          ariaLabel={`Move ${slot.sideNumber} to`}
          choices={towTargets(panels, slot).map((position) => ({
            value: positionKey(position),
            label: positionLabel(position),
          }))}
          onChange={(value) => value && onTow(slot, value)}
        />
      )}
    </Box>
  );
}
