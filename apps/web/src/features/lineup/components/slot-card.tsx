import { memo, type ReactNode } from 'react';
import { Badge, Box, Flex, HStack, Text } from '@chakra-ui/react';
import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import type { SlotView } from '@catline/contracts';
import { MarginGo } from '../../../components/go-badge.js';
import { GripIcon } from '../../../components/icons.js';
import { SLOT_STATUS_LABELS, SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { formatPounds } from '../../../lib/format.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { slotGoVerdict } from '../../../lib/launch-verdict.js';
import { slotItemId } from '../hooks/use-lineup-drag.js';
import { needsPilot, type SlotMark } from '../lineup-model.js';
import type { SlotAction } from '../slot-actions.js';
import { SlotMenu } from './action-menu.js';
import { GrossWeightParts } from '../../../components/gross-weight-parts.js';
import { LaunchTiming } from '../../../components/launch-timing.js';

const MARK_LABELS: Record<SlotMark, string> = { 'on-catapult': 'On cat', next: 'Next' };

/** The card's frame: its edge says launched, no-go or waiting; a lifted card floats above the board. */
function SlotCardFrame({
  slot,
  lifted,
  mark,
  children,
}: {
  slot: SlotView;
  lifted: boolean;
  mark?: SlotMark;
  children: ReactNode;
}) {
  const nogo = slot.figures && slot.status !== 'launched' && slotGoVerdict(slot) === 'nogo';
  return (
    <Flex
      align="flex-start"
      // A launched card steps back by its background, not by transparency: its badge keeps full contrast.
      bg={lifted ? 'bg.emphasized' : slot.status === 'launched' ? 'bg.muted' : 'bg.panel'}
      borderWidth={mark === 'on-catapult' ? '2px' : '1px'}
      borderColor={nogo ? 'nogo.border' : mark === 'on-catapult' ? 'accent.solid' : 'border'}
      borderLeftWidth={mark ? '8px' : '4px'}
      borderLeftColor={slot.status === 'launched' ? 'go.solid' : nogo ? 'nogo.solid' : 'accent.solid'}
      rounded="card"
      boxShadow={lifted ? 'lg' : undefined}
    >
      {children}
    </Flex>
  );
}

/**
 * What a slot card shows: who, what, how heavy, when, and whether the figures are go. Drawn again only
 * when its slot, mark or movability changes: a change replaces only the slots it touches, and redrawing
 * every card of a 40-aircraft board for each one cost a watching tablet most of its time.
 */
const SlotCardContent = memo(function SlotCardContent({
  slot,
  movable,
  mark,
}: {
  slot: SlotView;
  movable: boolean;
  mark?: SlotMark;
}) {
  const { optionalClock } = useShipClock();
  const figures = slot.figures;
  return (
    <Box ps="2" pe="1" py="1" minW="0" flex="1">
      <Flex align="center" gap="1.5" minW="0">
        <HStack gap="1.5" minW="0">
          {movable && (
            <Box as="span" color="fg.subtle" fontSize="sm" flexShrink={0}>
              <GripIcon />
            </Box>
          )}
          <Text
            fontWeight="700"
            fontSize="2xl"
            lineHeight="1.1"
            textStyle="figure"
            flexShrink={0}
            data-testid="side-number"
          >
            {slot.sideNumber}
          </Text>
          {mark && (
            <Badge
              size="sm"
              colorPalette="accent"
              variant={mark === 'on-catapult' ? 'solid' : 'outline'}
              flexShrink={0}
            >
              {MARK_LABELS[mark]}
            </Badge>
          )}
        </HStack>
      </Flex>
      <HStack gap="1.5" minW="0">
        <SlotStatusBadge status={slot.status} />
        <Text fontSize="sm" color="fg.muted" truncate>
          {slot.typeDesignation} · {slot.squadronCode} · {slot.pilotName ?? 'no pilot'}
          {slot.mission ? ` · ${slot.mission}` : ''}
        </Text>
      </HStack>
      <HStack gap="1.5" wrap="wrap" fontSize="sm" rowGap="0">
        <Text textStyle="figure">{formatPounds(slot.grossWeightLb)}</Text>
        <GrossWeightParts parts={slot.grossWeightParts} />
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
            {slot.heldSpare ? 'Spare, held' : 'Spare'}
          </Badge>
        )}
        {slot.armState && (
          <Badge
            size="sm"
            colorPalette="caution"
            variant={slot.armState === 'armed' ? 'solid' : 'outline'}
            data-testid="arm-state"
          >
            {slot.armState === 'armed' ? 'Armed' : 'Safe'}
          </Badge>
        )}
        {slot.waivers.length > 0 && (
          <Badge
            size="sm"
            colorPalette="caution"
            variant="outline"
            data-testid="waiver"
            title={slot.waivers.map((waiver) => `${waiver.by}: ${waiver.reason}`).join('; ')}
          >
            Waiver
          </Badge>
        )}
        {needsPilot(slot) && (
          <Badge size="sm" colorPalette="caution" variant="solid" data-testid="no-pilot">
            No pilot
          </Badge>
        )}
      </HStack>
      {figures && (
        <Flex justify="space-between" align="center" gap="2" fontSize="sm" wrap="wrap">
          <Text textStyle="figure" title="Projected launch time">
            {slot.launchedAt ? `Off ${optionalClock(slot.launchedAt)}` : optionalClock(slot.projectedLaunchAt)}
            {!slot.launchedAt && slot.timing && (
              <>
                {' · '}
                <LaunchTiming timing={slot.timing} windowOnly />
              </>
            )}
          </Text>
          <MarginGo slot={{ ...slot, figures }} />
        </Flex>
      )}
    </Box>
  );
});

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
  /** The aircraft on its lane's catapult, or the next one. */
  mark?: SlotMark;
  /** The card's menu entries: the menu sits beside the draggable area, so its keys and taps never start a drag. */
  actions: SlotAction[];
}

/**
 * Whether a card would draw the same: the same slot (a change replaces only the slots it touches), mark,
 * movability and menu entries. An entry's `run` is made anew on every render of the board, but for the
 * same slot it calls the same handlers, so the entries are compared by what they show.
 */
const drawsTheSame = (before: SortableSlotCardProps, after: SortableSlotCardProps) =>
  before.slot === after.slot &&
  before.movable === after.movable &&
  before.mark === after.mark &&
  before.actions.length === after.actions.length &&
  before.actions.every(
    (action, index) =>
      action.id === after.actions[index].id &&
      action.label === after.actions[index].label &&
      action.tone === after.actions[index].tone,
  );

/** A card nobody here can move is not a button, but is still named by its side number, type and status. */
const fixedCardName = (slot: SlotView, mark?: SlotMark) =>
  [slot.sideNumber, mark && MARK_LABELS[mark], slot.typeDesignation, SLOT_STATUS_LABELS[slot.status]]
    .filter(Boolean)
    .join(', ');

type Sortable = ReturnType<typeof useSortable>;

interface PlacedSlotCardProps
  extends SortableSlotCardProps, Pick<Sortable, 'attributes' | 'listeners' | 'setActivatorNodeRef'> {}

/** The card in its place on the board; its handle is the drag activator. */
const PlacedSlotCard = memo(
  function PlacedSlotCard({
    slot,
    movable,
    mark,
    actions,
    attributes,
    listeners,
    setActivatorNodeRef,
  }: PlacedSlotCardProps) {
    // The handle is named by what it shows (side number, mark, status, type, pilot, figures), so a person
    // who says or reads what they see finds it.
    return (
      <SlotCardFrame slot={slot} lifted={false} mark={mark}>
        <Box
          ref={setActivatorNodeRef}
          {...(movable ? { ...attributes, ...listeners } : { role: 'group', 'aria-label': fixedCardName(slot, mark) })}
          flex="1"
          minW="0"
          display="flex"
          cursor={movable ? 'grab' : 'default'}
          touchAction={movable ? 'manipulation' : undefined}
          rounded="card"
          _focusVisible={{ outline: '3px solid', outlineColor: 'accent.focusRing', outlineOffset: '2px' }}
        >
          <SlotCardContent slot={slot} movable={movable} mark={mark} />
        </Box>
        <SlotMenu slot={slot} actions={actions} />
      </SlotCardFrame>
    );
  },
  (before, after) =>
    drawsTheSame(before, after) &&
    before.attributes === after.attributes &&
    before.listeners === after.listeners &&
    before.setActivatorNodeRef === after.setActivatorNodeRef,
);

/**
 * A card of the board that can be dragged. dnd-kit draws every sortable card again at each step of a
 * drag and after each change of the board (twice per change on a watching screen); only this plain
 * wrapper follows it, and the Chakra card inside is drawn again when what it shows changes. Drawing all
 * 40 cards of the bench board for every change took most of a watching tablet's time.
 */
export const SortableSlotCard = memo(function SortableSlotCard(props: SortableSlotCardProps) {
  const { slot, movable, mark } = props;
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: slotItemId(slot.id),
    disabled: !movable,
  });
  return (
    <div
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition, opacity: isDragging ? 0.35 : 1 }}
      data-testid="slot-card"
      data-side-number={slot.sideNumber}
      data-status={slot.status}
      data-mark={mark}
    >
      <PlacedSlotCard
        {...props}
        attributes={attributes}
        listeners={listeners}
        setActivatorNodeRef={setActivatorNodeRef}
      />
    </div>
  );
}, drawsTheSame);
