import { useState, type ReactNode } from 'react';
import { Box, Grid, HStack, Stack, Text } from '@chakra-ui/react';
import { DndContext, DragOverlay } from '@dnd-kit/core';
import type { LaneView, LineupSnapshot, MoveSlotRequest, SlotView } from '@catline/contracts';
import { useLineupDrag } from '../hooks/use-lineup-drag.js';
import {
  isMovable,
  laneContainer,
  laneCounts,
  laneMarks,
  slotsById,
  type LineupWarning,
  type SlotMark,
} from '../lineup-model.js';
import type { SlotAction } from '../slot-actions.js';
import { ActionMenu, SlotMenu } from './action-menu.js';
import { DeckPoolStrip } from './deck-pool-strip.js';
import { LaneColumn } from './lane-column.js';
import { LineupWarnings } from './lineup-warnings.js';
import { LiftedSlotCard, SortableSlotCard } from './slot-card.js';

interface LineupBoardProps {
  snapshot: LineupSnapshot;
  /** The handler arranges the lineup: the catapult menus are there (disabled while not live). */
  arranges: boolean;
  /** The handler may drag now: arranges, and the board is live. */
  editable: boolean;
  onMove: (request: MoveSlotRequest) => void;
  /** The entries of a card's menu (empty for a person who only watches). */
  actionsFor: (slot: SlotView) => SlotAction[];
  onCatapultStatus: (lane: LaneView) => void;
  /** Under the deck pool's title: the handler's suggestion, or a word for those who only watch. */
  poolAction: ReactNode;
  /** The cycle's figures, beside the deck pool in the same band above the lanes, with the warnings. */
  summary: ReactNode;
  warnings: LineupWarning[];
}

export function LineupBoard({
  snapshot,
  arranges,
  editable,
  onMove,
  actionsFor,
  onCatapultStatus,
  poolAction,
  summary,
  warnings,
}: LineupBoardProps) {
  const [poolOpen, setPoolOpen] = useState(snapshot.pool.length > 0);
  const drag = useLineupDrag(snapshot, onMove);
  const slots = slotsById(snapshot);
  const held = drag.activeSlotId === null ? undefined : slots.get(drag.activeSlotId);
  const downSlots = snapshot.slots.filter((slot) => slot.status === 'down');
  const lanes = [...snapshot.lanes].sort((a, b) => a.number - b.number);
  const marks = new Map<number, SlotMark>(lanes.flatMap((lane) => [...laneMarks(lane, slots)]));

  const card = (slotId: number) => {
    const slot = slots.get(slotId);
    if (!slot) return null;
    return (
      <SortableSlotCard
        key={slot.id}
        slot={slot}
        movable={editable && isMovable(slot)}
        mark={marks.get(slot.id)}
        actions={actionsFor(slot)}
      />
    );
  };

  return (
    <DndContext {...drag.contextProps}>
      {/* Folded, the pool, the figures and the warnings share one row on a wide screen, so the band is only as
          tall as its tallest control and the lanes start higher; open, the cards set the band's height. */}
      <Grid
        gap="2"
        mb="2"
        alignItems={poolOpen ? undefined : 'center'}
        templateColumns={{
          base: 'minmax(0, 1fr)',
          lg: poolOpen ? 'minmax(0, 3fr) minmax(24rem, 2fr)' : 'auto auto minmax(0, 1fr)',
        }}
      >
        <DeckPoolStrip
          slotIds={drag.containers.pool}
          open={poolOpen}
          onToggle={() => setPoolOpen(!poolOpen)}
          action={poolAction}
          downList={
            downSlots.length > 0 && (
              <HStack gap="1" px="2" wrap="wrap" data-testid="down-list">
                <Text fontSize="sm" color="nogo.fg">
                  Down:
                </Text>
                {downSlots.map((slot) => (
                  // Each down aircraft keeps its menu: a spare for it, up again, its pilot.
                  <HStack key={slot.id} gap="0" data-side-number={slot.sideNumber}>
                    <Text fontSize="sm" color="nogo.fg" fontWeight="600">
                      {slot.sideNumber}
                    </Text>
                    <SlotMenu slot={slot} actions={actionsFor(slot)} />
                  </HStack>
                ))}
              </HStack>
            )
          }
        >
          {drag.containers.pool.map((slotId) => (
            <Box key={slotId} w="15rem" flexShrink={0}>
              {card(slotId)}
            </Box>
          ))}
        </DeckPoolStrip>
        {poolOpen ? (
          <Stack gap="1" minW="0">
            {summary}
            <LineupWarnings warnings={warnings} />
          </Stack>
        ) : (
          <>
            {summary}
            <LineupWarnings warnings={warnings} labelBeside />
          </>
        )}
      </Grid>
      <Grid
        gap="2"
        alignItems="start"
        templateColumns={{ base: 'minmax(0, 1fr)', sm: 'repeat(2, minmax(0, 1fr))', md: 'repeat(4, minmax(0, 1fr))' }}
      >
        {lanes.map((lane) => {
          const slotIds = drag.containers[laneContainer(lane.catapultId)] ?? lane.slotIds;
          return (
            <LaneColumn
              key={lane.catapultId}
              lane={lane}
              slotIds={slotIds}
              counts={laneCounts(lane, slots)}
              menu={
                arranges && (
                  <ActionMenu
                    label={`Actions for cat ${lane.number}`}
                    testId="catapult-menu"
                    actions={[
                      {
                        id: 'catapult-status',
                        label: lane.status === 'up' ? `Mark cat ${lane.number} down…` : `Mark cat ${lane.number} up…`,
                        tone: lane.status === 'up' ? 'danger' : undefined,
                        run: () => onCatapultStatus(lane),
                      },
                    ]}
                  />
                )
              }
            >
              {slotIds.map(card)}
            </LaneColumn>
          );
        })}
      </Grid>
      {/* No drop animation: the lifted card would float over the board after the drop and swallow the
          press of a drag started at once (the board already shows the card in its new place). */}
      <DragOverlay dropAnimation={null}>{held ? <LiftedSlotCard slot={held} /> : null}</DragOverlay>
    </DndContext>
  );
}
