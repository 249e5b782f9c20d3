import { useState } from 'react';
import { Box, Button, Flex, Heading, HStack, Input, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { DndContext, DragOverlay } from '@dnd-kit/core';
import {
  LANDING_AREA_STATES,
  type LandingAreaState,
  type LineupSnapshot,
  type ShipView,
  type SlotView,
} from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { ClosedCycleNotice } from '../../../components/closed-cycle-notice.js';
import { LiveFigures, useFiguresLive } from '../../../components/live-figures.js';
import { EmptyState, ErrorState, LoadingState, QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { SelectInput } from '../../../components/select-field.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useSetLandingArea } from '../api/set-landing-area.js';
import { useTowAircraft } from '../api/tow-aircraft.js';
import { deckPanels, positionFromKey, positionKey } from '../deck-model.js';
import { useDeckDrag } from '../hooks/use-deck-drag.js';
import { DeckPlaceRow } from './deck-place-row.js';
import { DeckStatusControl } from './deck-status-control.js';
import { LiftedChip, PositionChip } from './position-chip.js';
import { RespotPanel } from './respot-panel.js';
import { ShipTimeZone } from '../../../lib/ship-time.js';

const LANDING_WORDS: Record<LandingAreaState, string> = { clear: 'Clear', recovering: 'Recovering', fouled: 'Fouled' };

function LandingAreaControl({ snapshot }: { snapshot: LineupSnapshot }) {
  const { cycle } = snapshot;
  const handler = useHasRole('handler');
  const airBoss = useHasRole('air_boss');
  const sets = handler || airBoss;
  const [state, setState] = useState<LandingAreaState>(cycle.landingArea);
  const [reason, setReason] = useState('');
  const setLandingArea = useSetLandingArea(cycle.id);
  const { notice, show, dismiss } = useNotice();
  return (
    <Stack gap="1" borderWidth="1px" rounded="md" p="2" data-testid="landing-area">
      <Text fontWeight="700">
        Landing area: {LANDING_WORDS[cycle.landingArea]}
        {cycle.landingAreaReason ? ` — ${cycle.landingAreaReason}` : ''}
      </Text>
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      {sets && cycle.state !== 'closed' && (
        <HStack gap="2" wrap="wrap">
          <SelectInput
            value={state}
            ariaLabel="Landing area state"
            choices={LANDING_AREA_STATES.map((value) => ({ value, label: LANDING_WORDS[value] }))}
            onChange={(value) => setState(value as LandingAreaState)}
          />
          {state === 'fouled' && (
            <Input
              aria-label="What fouls it"
              placeholder="What fouls it"
              value={reason}
              maxLength={200}
              onChange={(event) => setReason(event.currentTarget.value)}
              maxW="16rem"
            />
          )}
          <Button
            minH="tap"
            colorPalette="accent"
            onClick={() =>
              setLandingArea.mutate(
                { state, reason: state === 'fouled' ? reason : null, basisVersion: snapshot.version },
                {
                  onSuccess: () =>
                    show({ tone: 'done', title: 'Landing area set', message: 'Everyone on the cycle sees it now.' }),
                  onError: (error) => show(refusalNotice(error, 'Setting the landing area')),
                },
              )
            }
          >
            Set
          </Button>
        </HStack>
      )}
    </Stack>
  );
}

function DeckWorkspace({ snapshot, ship }: { snapshot: LineupSnapshot; ship: ShipView }) {
  const live = useFiguresLive();
  const tows = useHasRole('handler') && snapshot.cycle.state !== 'closed' && live;
  const tow = useTowAircraft(snapshot.cycle.id);
  const { notice, show, dismiss } = useNotice();
  const panels = deckPanels(ship, snapshot);
  const onTow = (slot: SlotView, to: string) => {
    tow.mutate(
      { slotId: slot.id, slotVersion: slot.version, to: positionFromKey(to) },
      { onError: (error) => show(refusalNotice(error, 'The tow')) },
    );
  };
  const drag = useDeckDrag(panels, onTow);
  return (
    <Stack gap="2">
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <LandingAreaControl snapshot={snapshot} />
      <RespotPanel snapshot={snapshot} panels={panels} live={live} />
      <DndContext {...drag.contextProps}>
        <SimpleGrid columns={{ base: 2, lg: 3 }} gap="2">
          {panels.map((panel) => (
            <Box key={panel.title} borderWidth="1px" rounded="md" p="2" as="section" aria-label={panel.title}>
              <Heading as="h2" size="md" mb="1">
                {panel.title}
              </Heading>
              <Stack gap="1">
                {panel.places.map((place) => (
                  <DeckPlaceRow key={positionKey(place.position)} place={place}>
                    {place.slots.map((slot) => (
                      <PositionChip key={slot.id} slot={slot} panels={panels} onTow={tows ? onTow : null} />
                    ))}
                  </DeckPlaceRow>
                ))}
              </Stack>
            </Box>
          ))}
        </SimpleGrid>
        <DragOverlay>{drag.held ? <LiftedChip slot={drag.held} /> : null}</DragOverlay>
      </DndContext>
      {/* Below the deck, so the deck itself stays on a tablet's first screen. */}
      <DeckStatusControl snapshot={snapshot} />
    </Stack>
  );
}

/** The deck: every aircraft of the cycle on its position, the landing area, each catapult's deck status, and the handler's tows. */
export function DeckScreen() {
  const { cycles, cycleId, cycle, choose, finding } = useViewedCycle();
  const live = useLiveCycle(cycleId);
  const ships = useShips();
  const ship = ships.data?.find((candidate) => candidate.id === cycle?.shipId);
  return (
    <ShipTimeZone zone={(live.lineup.data?.cycle ?? cycle)?.timeZone}>
      <Stack gap="2">
        <Flex gap="2" rowGap="1" wrap="wrap" align="center">
          <Heading as="h1" size="xl" fontWeight="700" flexShrink={0}>
            Deck
          </Heading>
          <Box flex="1 1 24rem" minW="0">
            <CautionLine compact />
          </Box>
          {cycle && <ConnectionBadge state={live.connection} />}
          {cycles.data && cycles.data.length > 0 && (
            <CyclePicker cycles={cycles.data} value={cycle?.id} onChange={choose} />
          )}
        </Flex>
        <ClosedCycleNotice cycle={live.lineup.data?.cycle ?? cycle} />
        {finding || ships.isPending ? (
          <LoadingState label="Finding the current cycle…" />
        ) : cycles.isError && !cycles.data ? (
          <ErrorState error={cycles.error} onRetry={() => void cycles.refetch()} />
        ) : !cycle || !ship ? (
          <EmptyState title="No cycle yet">The deck appears here as soon as a cycle exists.</EmptyState>
        ) : live.refusal ? (
          <ErrorState title="This cycle cannot be followed live" error={new Error(live.refusal)} />
        ) : (
          <QueryView query={live.lineup} keepsStaleData loadingLabel="Loading the deck…">
            {(snapshot) => (
              <LiveFigures freshness={live.freshness}>
                <DeckWorkspace key={snapshot.cycle.id} snapshot={snapshot} ship={ship} />
              </LiveFigures>
            )}
          </QueryView>
        )}
      </Stack>
    </ShipTimeZone>
  );
}
