import { Button, Grid, GridItem, Text } from '@chakra-ui/react';
import { DndContext, DragOverlay } from '@dnd-kit/core';
import type { LaneView, LineupSnapshot, MoveSlotRequest, SlotView } from '@catline/contracts';
import { useLineupDrag } from '../hooks/use-lineup-drag.js';
import { isMovable, laneContainer, slotsById } from '../lineup-model.js';
import { LaneColumn } from './lane-column.js';
import { PoolColumn } from './pool-column.js';
import type { SlotAction } from '../slot-actions.js';
import { LiftedSlotCard, SortableSlotCard } from './slot-card.js';
import { SlotMenu } from './slot-menu.js';

interface LineupBoardProps {
  snapshot: LineupSnapshot;
  /** The handler edits; everyone else watches. */
  editable: boolean;
  onMove: (request: MoveSlotRequest) => void;
  /** The entries of a card's menu (empty for a person who only watches). */
  actionsFor: (slot: SlotView) => SlotAction[];
  onCatapultStatus: (lane: LaneView) => void;
}

export function LineupBoard({ snapshot, editable, onMove, actionsFor, onCatapultStatus }: LineupBoardProps) {
  const drag = useLineupDrag(snapshot, onMove);
  const slots = slotsById(snapshot);
  const held = drag.activeSlotId === null ? undefined : slots.get(drag.activeSlotId);
  const downSlots = snapshot.slots.filter((slot) => slot.status === 'down');
  const lanes = [...snapshot.lanes].sort((a, b) => a.number - b.number);

  const card = (slotId: number) => {
    const slot = slots.get(slotId);
    if (!slot) return null;
    return (
      <SortableSlotCard
        key={slot.id}
        slot={slot}
        movable={editable && isMovable(slot)}
        menu={editable && <SlotMenu slot={slot} actions={actionsFor(slot)} />}
      />
    );
  };

  return (
    <DndContext {...drag.contextProps}>
      <Grid
        gap="3"
        alignItems="start"
        templateColumns={{
          base: 'minmax(0, 1fr)',
          md: 'repeat(2, minmax(0, 1fr))',
          lg: 'repeat(4, minmax(0, 1fr))',
          xl: 'minmax(0, 1.1fr) repeat(4, minmax(0, 1fr))',
        }}
      >
        <GridItem colSpan={{ base: 1, md: 2, lg: 4, xl: 1 }} minW="0">
          <PoolColumn
            slotIds={drag.containers.pool}
            downList={
              downSlots.length > 0 && (
                <Text fontSize="sm" color="nogo.fg" px="1" data-testid="down-list">
                  Down: {downSlots.map((slot) => slot.sideNumber).join(', ')}
                </Text>
              )
            }
          >
            {drag.containers.pool.map(card)}
          </PoolColumn>
        </GridItem>
        {lanes.map((lane) => {
          const slotIds = drag.containers[laneContainer(lane.catapultId)] ?? lane.slotIds;
          return (
            <LaneColumn
              key={lane.catapultId}
              lane={lane}
              slotIds={slotIds}
              headerAction={
                editable && (
                  <Button
                    size="xs"
                    variant="outline"
                    colorPalette={lane.status === 'up' ? 'nogo' : 'go'}
                    onClick={() => onCatapultStatus(lane)}
                    alignSelf="flex-start"
                  >
                    {lane.status === 'up' ? `Mark cat ${lane.number} down` : `Mark cat ${lane.number} up`}
                  </Button>
                )
              }
            >
              {slotIds.map(card)}
            </LaneColumn>
          );
        })}
      </Grid>
      <DragOverlay>{held ? <LiftedSlotCard slot={held} /> : null}</DragOverlay>
    </DndContext>
  );
}
